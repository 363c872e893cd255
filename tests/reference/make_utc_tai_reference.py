#!/usr/bin/env python3
"""Writes the UTC/TAI reference tables used by the leap-second tests, computed with pyerfa
(ERFA, the BSD-licensed derivative of the IAU SOFA library):

  utc_tai_erfa.csv      one UTC reading per row (utc_mjd, sod_s):
                          tai_minus_utc_dat_s    erfa.dat(iy, im, id, fd) with fd = sod / 86400
                          dat_method             how fd was chosen (see below)
                          tai_minus_utc_utctai_s erfa.utctai on the two-part quasi-JD
                                                 (2400000.5 + mjd, sod / (86400 + dleap)), minus
                                                 the reading: limited to about 1e-11 s by the
                                                 double-precision day fraction
  utc_day_erfa.csv      per UTC day (utc_mjd): dat0_s, dlod_s, dleap_s as eraUtctai forms them
                        (dat0 = dat(day, 0), dlod = 2 (dat(day, 0.5) - dat0),
                         dleap = dat(next day, 0) - (dat0 + dlod))

dat_method: "fd" when sod <= 86400 s; "fd1" for a reading inside a leap second from 1972 on
(eraDat ignores fd after 1972, ERFA dat.c note 4, so fd = 1 is passed); "linear" for a reading
past 86400 s on a drift-era day with a positive jump (eraDat refuses fd > 1): the day's linear
formula extended, dat(day, 1) + (dat(day, 1) - dat(day, 0)) (sod - 86400) / 86400.

Run: python3 tests/reference/make_utc_tai_reference.py   (deterministic: fixed generator start value)
"""
import csv
import os
import random
from decimal import Decimal

import warnings

import erfa

# eraDat flags years after its release year + 5 as "dubious" (status +1) but still computes
# them normally (ERFA dat.c note 1); the table runs to 2100, so the warning is expected.
warnings.simplefilter("ignore", erfa.ErfaWarning)

HERE = os.path.dirname(os.path.abspath(__file__))
DAY = Decimal(86400)


def ymd(mjd):
    iy, im, id_, _ = erfa.jd2cal(2400000.5, float(mjd))
    return int(iy), int(im), int(id_)


def dat(mjd, fd):
    iy, im, id_ = ymd(mjd)
    return float(erfa.dat(iy, im, id_, fd))


def day_terms(mjd):
    dat0 = dat(mjd, 0.0)
    dlod = 2.0 * (dat(mjd, 0.5) - dat0)
    dleap = dat(mjd + 1, 0.0) - (dat0 + dlod)
    return dat0, dlod, dleap


def change_days():
    """First days (MJD) of every TAI-UTC expression in ERFA's table."""
    days = []
    for iy, im, _ in erfa.leap_seconds.get():
        _, djm = erfa.cal2jd(int(iy), int(im), 1)
        days.append(int(djm))
    return days


def reading_row(mjd, sod):
    """sod: Decimal seconds of the UTC day."""
    iy = ymd(mjd)[0]
    dat0, dlod, dleap = day_terms(mjd)
    if sod <= DAY:
        method, value = "fd", dat(mjd, float(sod / DAY))
    elif iy >= 1972:
        method, value = "fd1", dat(mjd, 1.0)
    else:
        d1 = dat(mjd, 1.0)
        method, value = "linear", d1 + (d1 - dat(mjd, 0.0)) * float((sod - DAY) / DAY)
    tai1, tai2 = erfa.utctai(2400000.5 + mjd, float(sod / (DAY + Decimal(repr(dleap)))))
    via_utctai = ((tai1 - (2400000.5 + mjd)) + tai2) * 86400.0 - float(sod)
    return [mjd, str(sod), repr(float(value)), method, repr(float(via_utctai))]


def main():
    rng = random.Random(20240601)
    changes = change_days()
    readings = set()
    days = set()
    for d in changes:
        prev = d - 1
        days.update({prev, d})
        if prev >= changes[0]:
            # the drift-era jumps are whole multiples of 1e-7 s (7-decimal table constants)
            dleap = Decimal(repr(day_terms(prev)[2])).quantize(Decimal("1e-7"))
            length = DAY + dleap  # ERFA's day length (a negative jump shortens the day)
            for s in (Decimal(0), Decimal(43200), length - Decimal("0.5") - max(dleap, 0),
                      length - Decimal("0.000001") - max(dleap, 0)):
                readings.add((prev, s))
            if dleap > 0:
                # inside the inserted interval: half-way, and 0.5 s in for a full leap second
                readings.add((prev, DAY + dleap / 2))
                if dleap >= 1:
                    readings.add((prev, Decimal("86400.5")))
                    readings.add((prev, Decimal("86400.999999")))
        for s in ("0", "0.5", "1"):
            readings.add((d, Decimal(s)))
    # drift era 1960-1971: every 7th day at a random time of day
    for mjd in range(changes[0], 41317, 7):
        readings.add((mjd, Decimal(rng.randrange(0, 86400 * 10**6)) / 10**6))
        days.add(mjd)
    # 1972-2100 (MJD 41317..88069): random days and times
    for _ in range(1500):
        mjd = rng.randrange(41317, 88069)
        readings.add((mjd, Decimal(rng.randrange(0, 86400 * 10**6)) / 10**6))
        days.add(mjd)
    with open(os.path.join(HERE, "utc_tai_erfa.csv"), "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["utc_mjd", "sod_s", "tai_minus_utc_dat_s", "dat_method",
                    "tai_minus_utc_utctai_s"])
        for mjd, sod in sorted(readings):
            w.writerow(reading_row(mjd, sod))
    with open(os.path.join(HERE, "utc_day_erfa.csv"), "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["utc_mjd", "dat0_s", "dlod_s", "dleap_s"])
        for mjd in sorted(days):
            if mjd >= changes[0]:
                w.writerow([mjd] + [repr(float(x)) for x in day_terms(mjd)])
    print(f"{len(readings)} readings, {len(days)} days; ERFA table {len(changes)} entries")


if __name__ == "__main__":
    main()
