#!/usr/bin/env python3
"""Reference values of the CIP X, Y from pyerfa (ERFA): the series route and the matrix route.

Writes tests/reference/cip_xy06_erfa.csv, read by the tests of
src/physics/earth/orientation/xy_series.rs. Run from anywhere:

    python3 tests/reference/make_xy06_reference.py

Epochs: TT as MJD drawn uniformly over 1962-01-01 .. 2100-01-01 by a pseudo-random generator
with a fixed initial state (so the file is reproducible), plus a few fixed epochs. TT is the
two-part Julian date (2400000.5, mjd_tt).

Columns (radians): X, Y from erfa.xy06 (the IAU 2006/2000A series for X, Y), and X, Y from
erfa.xys06a (the same model through the bias-precession-nutation matrix, erfa.pnm06a and
erfa.bpn2xy). Numbers are written with repr(), which round-trips doubles exactly.
"""

import pathlib
import random

import erfa
import erfa.version

OUT = pathlib.Path(__file__).resolve().parent / "cip_xy06_erfa.csv"

MJD0 = 2400000.5
START_MJD = 37665.0  # 1962-01-01
END_MJD = 88069.0  # 2100-01-01
ROW_COUNT = 400
GENERATOR_STATE = 20_261_204  # arbitrary fixed integer


def main():
    rng = random.Random(GENERATOR_STATE)
    epochs = [51544.5, 53736.0, START_MJD, END_MJD]
    epochs += [rng.uniform(START_MJD, END_MJD) for _ in range(ROW_COUNT - len(epochs))]
    lines = [
        f"# CIP X, Y from pyerfa {erfa.__version__} (ERFA {erfa.version.erfa_version})",
        "# made by tests/reference/make_xy06_reference.py; TT = (2400000.5, mjd_tt); radians",
        "# x_series, y_series: xy06; x_matrix, y_matrix: xys06a (bpn2xy of pnm06a)",
        "mjd_tt,x_series,y_series,x_matrix,y_matrix",
    ]
    for mjd_tt in epochs:
        x_series, y_series = (float(v) for v in erfa.xy06(MJD0, mjd_tt))
        x_matrix, y_matrix, _ = (float(v) for v in erfa.xys06a(MJD0, mjd_tt))
        values = [mjd_tt, x_series, y_series, x_matrix, y_matrix]
        lines.append(",".join(repr(float(v)) for v in values))
    OUT.write_text("\n".join(lines) + "\n")
    print(f"wrote {len(epochs)} rows to {OUT}")


if __name__ == "__main__":
    main()
