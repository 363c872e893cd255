#!/usr/bin/env python3
"""Reference values for the Earth orientation tests (src/physics/earth/eop/tests_*.rs).

    pip install astropy-iers-data==0.2026.11.2.0.34.55
    python3 tests/reference/make_eop_reference.py

Writes, from the IERS files of that package (no numpy, scipy, pyerfa or astropy: plain Python):
- eop_interp_reference.csv: (1) `tab` rows: values printed in the files at tabulated days
  (IERS EOP 20 C04 eopc04.1962-now up to its last day, IERS Bulletin A finals2000A.all after
  it), as text; (2) `interp` rows: an independent 4-point Lagrange interpolation of UT1-TAI,
  x_p and y_p at seeded random UTC instants 1972-2027 and around three leap seconds, UT1-TAI
  built with TAI-UTC from the package's Leap_Second.dat.
- eop_finals2000A_*.all, eop_c04_*.txt: unchanged excerpts of the two files (consecutive days).
"""
import os
import random

import astropy_iers_data

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.join(os.path.dirname(astropy_iers_data.__file__), "data")
SEED = 20261202


def leap_table():
    """[(mjd, tai_utc)] from Leap_Second.dat (1972 on)."""
    out = []
    for line in open(os.path.join(DATA, "Leap_Second.dat")):
        if line.startswith("#") or not line.strip():
            continue
        f = line.split()
        out.append((int(float(f[0])), int(f[4])))
    return out


def tai_utc(leaps, mjd):
    value = None
    for start, offset in leaps:
        if mjd >= start:
            value = offset
    return value


def read_series():
    """{mjd: (ut1_text, xp_text, yp_text, file)} spliced as tools/make_eop_snapshot.py does."""
    days = {}
    for line in open(os.path.join(DATA, "eopc04.1962-now")):
        if line.startswith("#") or not line.strip():
            continue
        f = line.split()
        days[int(float(f[4]))] = (f[7], f[5], f[6], "eopc04.1962-now")
    c04_last = max(days)
    for line in open(os.path.join(DATA, "finals2000A.all")):
        line = line.rstrip("\n").ljust(187)
        if not line[58:68].strip():
            continue
        mjd = int(float(line[7:15]))
        if mjd > c04_last:
            days[mjd] = (line[58:68].strip(), line[18:27].strip(), line[37:46].strip(),
                         "finals2000A.all")
    return days


def lagrange(x, ys):
    """Value at x (relative to the first node) of the polynomial through (0..n-1, ys)."""
    n = len(ys)
    total = 0.0
    for i in range(n):
        p = 1.0
        for j in range(n):
            if j != i:
                p *= (x - j) / (i - j)
        total += p * ys[i]
    return total


def interpolate(days, leaps, mjd, sod):
    first, last = min(days), max(days)
    start = min(max(mjd - 1, first), last - 3)
    nodes = list(range(start, start + 4))
    # a day ending with a leap second lasts 86401 s between the 0h UTC nodes
    day_s = 86400.0 + tai_utc(leaps, mjd + 1) - tai_utc(leaps, mjd)
    x = (mjd - start) + sod / day_s
    ut1_tai = [float(days[m][0]) - tai_utc(leaps, m) for m in nodes]
    ut1 = lagrange(x, ut1_tai) + tai_utc(leaps, mjd)
    xp = lagrange(x, [float(days[m][1]) for m in nodes])
    yp = lagrange(x, [float(days[m][2]) for m in nodes])
    return ut1, xp, yp


def excerpt(src, dst, keep):
    with open(os.path.join(DATA, src)) as f, open(os.path.join(HERE, dst), "w") as out:
        for line in f:
            if keep(line):
                out.write(line)


def main():
    rng = random.Random(SEED)
    leaps = leap_table()
    days = read_series()
    first, last = min(days), max(days)
    rows = ["kind,utc_mjd,sod_s,ut1_utc_s,xp_arcsec,yp_arcsec,file"]
    for mjd in sorted(rng.sample(range(first, last + 1), 300)) + [first, last]:
        ut1, xp, yp, name = days[mjd]
        rows.append(f"tab,{mjd},0,{ut1},{xp},{yp},{name}")
    instants = [(rng.randrange(41320, last), rng.uniform(0.0, 86400.0)) for _ in range(400)]
    for leap_mjd in (56109, 57204, 57754):  # 2012-07-01, 2015-07-01, 2017-01-01
        for day in range(leap_mjd - 2, leap_mjd + 2):
            # 86400.5 s exists only on the days ending with a leap second
            for sod in (0.0, 0.5, 43200.0, 86399.0, 86400.5, rng.uniform(0.0, 86400.0)):
                if sod < 86400.0 + tai_utc(leaps, day + 1) - tai_utc(leaps, day):
                    instants.append((day, sod))
    for mjd, sod in sorted(instants):
        ut1, xp, yp = interpolate(days, leaps, mjd, sod)
        rows.append(f"interp,{mjd},{sod!r},{ut1!r},{xp!r},{yp!r},spliced")
    with open(os.path.join(HERE, "eop_interp_reference.csv"), "w") as out:
        out.write("\n".join(rows) + "\n")

    def finals_mjd(line):
        return int(float(line[7:15]))

    def c04_mjd(line):
        return -1 if line.startswith("#") else int(float(line.split()[4]))

    excerpt("finals2000A.all", "eop_finals2000A_2026_2027.all",
            lambda line: finals_mjd(line) >= 61253)
    excerpt("finals2000A.all", "eop_finals2000A_leap_2016.all",
            lambda line: 57723 <= finals_mjd(line) <= 57784)
    excerpt("eopc04.1962-now", "eop_c04_1963.txt",
            lambda line: line.startswith("#") or 38300 <= c04_mjd(line) <= 38420)
    excerpt("eopc04.1962-now", "eop_c04_leap_2016.txt",
            lambda line: line.startswith("#") or 57723 <= c04_mjd(line) <= 57784)
    with open(os.path.join(HERE, "eop_reference_versions.txt"), "w") as out:
        out.write(f"astropy-iers-data {astropy_iers_data.__version__} (PyPI); seed {SEED}\n")


if __name__ == "__main__":
    main()
