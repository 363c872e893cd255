#!/usr/bin/env python3
"""Reference GCRS velocities of Earth-fixed points from pyerfa (ERFA): the time derivative of
the IAU 2006/2000A GCRS <-> ITRS rotation, by finite differences of erfa.c2t06a matrices.

Writes tests/reference/orientation_rate_erfa.csv, read by the tests of
src/physics/earth/orientation/pole_rate.rs. Run from anywhere:

    python3 tests/reference/make_orientation_rate_reference.py

Epochs: TT as MJD (whole day and fraction) drawn uniformly over 1962-01-01 .. 2100-01-01 by a pseudo-random generator
with a fixed initial state (so the file is reproducible). UT1 - TT is held constant around each
epoch (drawn in [-70 s, +5 s]) and the pole xp, yp too (drawn in [-1", +1"]), so the
reference's rate holds the Earth rotation at its nominal rate (d ERA / d TT = 2 pi
1.00273781191135448 / 86400 s) and no polar-motion or length-of-day rate: what is left beyond
the Earth rotation is the precession-nutation rate of Q(t) (and s', -47 uas per century).

For each epoch, a point at rest in the ITRS at the Earth's surface (radius 6378137 m, random
direction) and one at a navigation-orbit radius (26 560 km): position r_itrs (m) and the GCRS
velocity v = d/dt (M(t)^T r_itrs), M = c2t06a(TT, UT1, xp, yp), by the fourth-order central
difference (8 (f(h) - f(-h)) - (f(2h) - f(-2h))) / (12 h) with h = 60 s: truncation error
(omega h)^4 omega r / 30 = 6e-9 m/s at the surface, 2e-8 m/s at 26 560 km; rounding: ERFA's
era00 forms Tu = (day fraction) + (whole days since J2000), whose rounding (up to 1.8e-12 day)
moves the angle by up to 3e-14 rad, 2e-7 m at the surface, 8e-7 m at 26 560 km, divided by
about 40 s in the formula (with h = 1 s that noise reached 7e-7 and 3.5e-6 m/s).
Numbers are written with repr().
"""

import math
import pathlib
import random

import erfa
import erfa.version
import numpy as np

OUT = pathlib.Path(__file__).resolve().parent / "orientation_rate_erfa.csv"

MJD0 = 2400000.5
START_MJD = 37665.0  # 1962-01-01
END_MJD = 88069.0  # 2100-01-01
EPOCH_COUNT = 100
GENERATOR_STATE = 20_261_205  # arbitrary fixed integer
ARCSEC = erfa.DAS2R
RADII_M = (6_378_137.0, 26_560_000.0)
STEP_S = 60.0


def gcrs_position(mjd_day, day_fraction, ut1_minus_tt_s, xp, yp, r_itrs, dt_s):
    # Two-part dates with the whole days apart, so the fraction keeps 1e-11 s.
    jd1 = MJD0 + mjd_day
    tt2 = day_fraction + dt_s / 86400.0
    ut2 = day_fraction + (ut1_minus_tt_s + dt_s) / 86400.0
    matrix = erfa.c2t06a(jd1, tt2, jd1, ut2, xp, yp)
    return np.asarray(matrix).T @ r_itrs


def main():
    rng = random.Random(GENERATOR_STATE)
    lines = [
        f"# GCRS velocities of ITRS points at rest from pyerfa {erfa.__version__} "
        f"(ERFA {erfa.version.erfa_version})",
        "# made by tests/reference/make_orientation_rate_reference.py; TT = (2400000.5 + mjd_day, "
        "day_fraction), UT1 = TT + ut1_minus_tt_s; xp, yp in rad; metres, m/s",
        "# v_gcrs = d/dt (c2t06a(TT, UT1, xp, yp)^T r_itrs), fourth-order central difference, h = 60 s",
        "mjd_day,day_fraction,ut1_minus_tt_s,xp,yp,rx,ry,rz,vx,vy,vz",
    ]
    for _ in range(EPOCH_COUNT):
        mjd_tt = rng.uniform(START_MJD, END_MJD)
        mjd_day = math.floor(mjd_tt)
        day_fraction = mjd_tt - mjd_day
        ut1_minus_tt_s = rng.uniform(-70.0, 5.0)
        xp = rng.uniform(-1.0, 1.0) * ARCSEC
        yp = rng.uniform(-1.0, 1.0) * ARCSEC
        for radius in RADII_M:
            z = rng.uniform(-1.0, 1.0)
            longitude = rng.uniform(0.0, 2.0 * math.pi)
            rho = math.sqrt(1.0 - z * z)
            r_itrs = np.array(
                [radius * rho * math.cos(longitude), radius * rho * math.sin(longitude), radius * z]
            )
            f = lambda dt: gcrs_position(mjd_day, day_fraction, ut1_minus_tt_s, xp, yp, r_itrs, dt)
            h = STEP_S
            v = (8.0 * (f(h) - f(-h)) - (f(2 * h) - f(-2 * h))) / (12.0 * h)
            values = [mjd_day, day_fraction, ut1_minus_tt_s, xp, yp, *r_itrs, *v]
            lines.append(",".join(repr(float(x)) for x in values))
    OUT.write_text("\n".join(lines) + "\n")
    print(f"wrote {2 * EPOCH_COUNT} rows to {OUT}")


if __name__ == "__main__":
    main()
