#!/usr/bin/env python3
"""Reference vectors for the time-scale conversions, computed with ERFA through pyerfa.

Writes tests/reference/time_conversions_erfa.csv. Each row is one conversion: the input instant
(exact decimal text in a format the service reads), the source and target scales, and the
expected difference (target reading minus input reading, seconds) from ERFA:

  utc_tai  erfa.dat          TAI - UTC at a UTC date and day fraction (1960-2100, drift era,
                             leap-second days)
  tt_tcg   erfa.tttcg        TCG - TT  (IAU 2000 B1.9)
  tcg_tt   erfa.tcgtt        TT - TCG
  tt_tdb   erfa.dtdb         TDB - TT  (Fairhead & Bretagnon 1990 as in ERFA), geocentric and
                             topocentric (observer ITRF position; ut = UTC fraction of day)
  tdb_tcb  erfa.tdbtcb       TCB - TDB (IAU 2006 B3)
  tcb_tdb  erfa.tcbtdb       TDB - TCB

To keep ERFA's own rounding below 1e-15 s, each epoch is given to ERFA as a one-part Julian
date (date2 = 0), so ERFA returns the offset in its second part; the input text is the exact
decimal value of that double, which the service reads without loss.

Run:  pip install pyerfa numpy && python3 tests/reference/make_time_conversion_reference.py
"""
import csv
import math
import os
import random
from decimal import Decimal, getcontext

import erfa

getcontext().prec = 50
OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "time_conversions_erfa.csv")
DAY = Decimal(86400)
rng = random.Random(20261202)

# Invented observer sites (ITRF metres): a mountain station, a coastal station, a polar station.
OBSERVERS = [
    (4027894.0, 307045.0, 4919474.9),
    (-2409150.0, -4478573.0, 3838617.0),
    (1130773.0, -831253.0, 6214563.0),
]


def exact(x):
    """Exact decimal text of a double."""
    return format(Decimal(x), "f")


def random_jd(first_year=1960, last_year=2100):
    _, mjd1 = erfa.cal2jd(first_year, 1, 1)
    _, mjd2 = erfa.cal2jd(last_year, 12, 31)
    return float(mjd1 + 2400000.5 + rng.random() * (mjd2 - mjd1))


def utc_rows():
    rows = []
    dates = []
    for _ in range(400):
        year = rng.randint(1960, 2100)
        month = rng.randint(1, 12)
        day = rng.randint(1, 28)
        dates.append((year, month, day, rng.random()))
    # Every drift-segment start and leap-second day, before and after midnight.
    for year, month in [(1961, 1), (1961, 8), (1962, 1), (1963, 11), (1964, 1), (1964, 4),
                        (1964, 9), (1965, 1), (1965, 3), (1965, 7), (1965, 9), (1966, 1),
                        (1968, 2), (1972, 1), (1972, 7), (1973, 1), (1981, 7), (1999, 1),
                        (2006, 1), (2009, 1), (2012, 7), (2015, 7), (2017, 1)]:
        dates.append((year, month, 1, 0.0))
        dates.append((year, month, 1, 1.0 / 86400.0))
    for year, month, day, fraction in dates:
        seconds = Decimal(fraction) * DAY
        if seconds >= DAY:
            continue
        dat = erfa.dat(year, month, day, fraction)
        whole = int(seconds)
        frac_text = format(seconds - whole, ".18f")[2:]
        text = "%04d-%02d-%02dT%02d:%02d:%02d.%s" % (
            year, month, day, whole // 3600, (whole // 60) % 60, whole % 60, frac_text)
        rows.append(("utc_tai", "UTC", "TAI", "iso", text, repr(float(dat)), "", "", ""))
    # Inside leap seconds: TAI - UTC is the value of the day that ends with the leap second.
    for year, month, day in [(1972, 6, 30), (1998, 12, 31), (2008, 12, 31), (2016, 12, 31)]:
        dat = erfa.dat(year, month, day, 0.5)
        text = "%04d-%02d-%02dT23:59:60.25" % (year, month, day)
        rows.append(("utc_tai", "UTC", "TAI", "iso", text, repr(float(dat)), "", "", ""))
    return rows


def tt_rows():
    rows = []
    for _ in range(300):
        jd = random_jd()
        tcg1, tcg2 = erfa.tttcg(jd, 0.0)
        rows.append(("tt_tcg", "TT", "TCG", "jd", exact(jd),
                     repr(float(((tcg1 - jd) + tcg2) * 86400.0)), "", "", ""))
        tt1, tt2 = erfa.tcgtt(jd, 0.0)
        rows.append(("tcg_tt", "TCG", "TT", "jd", exact(jd),
                      repr(float(((tt1 - jd) + tt2) * 86400.0)), "", "", ""))
        dtr = erfa.dtdb(jd, 0.0, 0.0, 0.0, 0.0, 0.0)
        rows.append(("tt_tdb", "TT", "TDB", "jd", exact(jd), repr(float(dtr)), "", "", ""))
        tcb1, tcb2 = erfa.tdbtcb(jd, 0.0)
        rows.append(("tdb_tcb", "TDB", "TCB", "jd", exact(jd),
                     repr(float(((tcb1 - jd) + tcb2) * 86400.0)), "", "", ""))
        tdb1, tdb2 = erfa.tcbtdb(jd, 0.0)
        rows.append(("tcb_tdb", "TCB", "TDB", "jd", exact(jd),
                     repr(float(((tdb1 - jd) + tdb2) * 86400.0)), "", "", ""))
    for _ in range(300):
        jd = random_jd()
        x, y, z = OBSERVERS[rng.randrange(len(OBSERVERS))]
        tai1, tai2 = erfa.tttai(jd, 0.0)
        utc1, utc2 = erfa.taiutc(tai1, tai2)
        ut = ((utc1 - 2400000.5) + utc2) % 1.0
        if ut > 1.0 - 2.0 / 86400.0:
            continue  # stay clear of a possible leap second at the end of the day
        elong = math.atan2(y, x)
        u = math.hypot(x, y) / 1000.0
        v = z / 1000.0
        dtr = erfa.dtdb(jd, 0.0, ut, elong, u, v)
        rows.append(("tt_tdb_topocentric", "TT", "TDB", "jd", exact(jd), repr(float(dtr)),
                     repr(x), repr(y), repr(z)))
    return rows


def main():
    rows = utc_rows() + tt_rows()
    with open(OUT, "w", newline="") as handle:
        handle.write("# Time-scale conversion reference vectors from ERFA via pyerfa %s\n" % erfa.__version__)
        handle.write("# Made by tests/reference/make_time_conversion_reference.py (seeded: rerun to regenerate)\n")
        writer = csv.writer(handle, lineterminator="\n")
        writer.writerow(["kind", "from", "to", "format", "input", "expected_difference_s",
                         "observer_x_m", "observer_y_m", "observer_z_m"])
        writer.writerows(rows)
    print("wrote %d rows to %s" % (len(rows), OUT))


if __name__ == "__main__":
    main()
