#!/usr/bin/env python3
"""Reference values of Earth orientation from pyerfa (ERFA), IAU 2006/2000A, CIO based.

Writes tests/reference/earth_orientation_erfa.csv, read by the tests of
src/physics/earth/orientation. Run from anywhere:

    python3 tests/reference/make_orientation_reference.py

Epochs: TT as MJD drawn uniformly over 1962-01-01 .. 2100-01-01 by a pseudo-random generator
with a fixed initial state (so the file is reproducible), plus a few fixed epochs. Each row
gives TT as the two-part Julian date (2400000.5, mjd_tt) and UT1 as (2400000.5, mjd_ut1) with
UT1 - TT drawn in [-70 s, +5 s] (the range of UT1 - TT over that span, roughly). Pole coordinates
xp, yp are drawn in [-1", +1"]; on every second row celestial-pole offsets dX, dY are drawn in
[-1 mas, +1 mas] (zero on the others).

Columns (radians): ERA (erfa.era00), GMST (erfa.gmst06), GAST (erfa.gst06a), X, Y, s
(erfa.xys06a: X, Y from the NPB matrix, s from erfa.s06), and the nine elements of the
GCRS -> ITRS matrix row by row: erfa.c2t06a when dX = dY = 0, else
erfa.c2tcio(erfa.c2ixys(X + dX, Y + dY, s), era, erfa.pom00(xp, yp, erfa.sp00(tt))) (the
IERS Conventions (2010) sec. 5.5.4 way of applying the offsets, which c2t06a does with zero
offsets). Numbers are written with repr(), which round-trips doubles exactly.
"""

import pathlib
import random

import erfa
import erfa.version

OUT = pathlib.Path(__file__).resolve().parent / "earth_orientation_erfa.csv"

MJD0 = 2400000.5
START_MJD = 37665.0  # 1962-01-01
END_MJD = 88069.0  # 2100-01-01
ROW_COUNT = 200
GENERATOR_STATE = 20_100_505  # arbitrary fixed integer
ARCSEC = erfa.DAS2R


def main():
    rng = random.Random(GENERATOR_STATE)
    epochs = [51544.5, 53736.0, START_MJD, END_MJD, 54388.0]
    epochs += [rng.uniform(START_MJD, END_MJD) for _ in range(ROW_COUNT - len(epochs))]
    lines = [
        f"# Earth orientation from pyerfa {erfa.__version__} (ERFA {erfa.version.erfa_version})",
        "# made by tests/reference/make_orientation_reference.py; TT = (2400000.5, mjd_tt), "
        "UT1 = (2400000.5, mjd_ut1); angles in radians",
        "# era: era00; gmst: gmst06; gast: gst06a; x, y, s: xys06a; m11..m33: GCRS->ITRS "
        "(c2t06a, or c2tcio(c2ixys(x+dx, y+dy, s), era, pom00(xp, yp, sp00)) with offsets)",
        "mjd_tt,mjd_ut1,xp,yp,dx,dy,era,gmst,gast,x,y,s,"
        "m11,m12,m13,m21,m22,m23,m31,m32,m33",
    ]
    for index, mjd_tt in enumerate(epochs):
        mjd_ut1 = mjd_tt + rng.uniform(-70.0, 5.0) / 86400.0
        xp = rng.uniform(-1.0, 1.0) * ARCSEC
        yp = rng.uniform(-1.0, 1.0) * ARCSEC
        if index % 2 == 1:
            dx = rng.uniform(-1.0, 1.0) * 1e-3 * ARCSEC
            dy = rng.uniform(-1.0, 1.0) * 1e-3 * ARCSEC
        else:
            dx = dy = 0.0
        era = float(erfa.era00(MJD0, mjd_ut1))
        gmst = float(erfa.gmst06(MJD0, mjd_ut1, MJD0, mjd_tt))
        gast = float(erfa.gst06a(MJD0, mjd_ut1, MJD0, mjd_tt))
        x, y, s = (float(v) for v in erfa.xys06a(MJD0, mjd_tt))
        if dx == 0.0 and dy == 0.0:
            matrix = erfa.c2t06a(MJD0, mjd_tt, MJD0, mjd_ut1, xp, yp)
        else:
            c2i = erfa.c2ixys(x + dx, y + dy, s)
            pom = erfa.pom00(xp, yp, erfa.sp00(MJD0, mjd_tt))
            matrix = erfa.c2tcio(c2i, era, pom)
        values = [mjd_tt, mjd_ut1, xp, yp, dx, dy, era, gmst, gast, x, y, s]
        values += [float(matrix[i][j]) for i in range(3) for j in range(3)]
        lines.append(",".join(repr(float(v)) for v in values))
    OUT.write_text("\n".join(lines) + "\n")
    print(f"wrote {len(epochs)} rows to {OUT}")


if __name__ == "__main__":
    main()
