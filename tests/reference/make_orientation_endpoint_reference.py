#!/usr/bin/env python3
"""Reference values for `GET /v1/earth/orientation` from pyerfa (ERFA), IAU 2006/2000A.

Writes tests/reference/orientation_endpoint_erfa.csv, read by tests/earth_orientation_api.rs.
Run from anywhere:

    python3 tests/reference/make_orientation_endpoint_reference.py

Epochs: a seeded choice (fixed generator state, so the file is reproducible) of the `interp`
rows of tests/reference/eop_interp_reference.csv, which tests/reference/make_eop_reference.py
made from the IERS tables of astropy-iers-data 0.2026.11.2.0.34.55 (the version the built-in
EOP table is made from, src/physics/earth/eop/mod.rs): UTC instants 1972-2027 with UT1 - UTC,
x_p and y_p interpolated there (4-point Lagrange, independent of the service). Some rows are
on predicted days (after MJD 61335, the last observed day). The UTC second of day is rounded
to the nanosecond and written as ISO 8601 text, the instant the endpoint is asked about; the
EOP values stay those of the unrounded instant (they change by below 1e-16 s in 1 ns).

Columns: utc_iso, utc_mjd, sod_s, ut1_utc_s, xp_arcsec, yp_arcsec (inputs), then radians:
era (erfa.era00), gmst (erfa.gmst06), gast (erfa.gst06a), x, y, s (erfa.xys06a), sp
(erfa.sp00), and m11..m33, the GCRS -> ITRS matrix row by row (erfa.c2t06a with xp, yp).
UTC -> TT through erfa.utctai and erfa.taitt, UTC -> UT1 through erfa.utcut1 with UT1 - UTC;
all with the leap seconds of ERFA's own table. Numbers are written with repr().
"""

import pathlib
import random

import erfa
import erfa.version

HERE = pathlib.Path(__file__).resolve().parent
SOURCE = HERE / "eop_interp_reference.csv"
OUT = HERE / "orientation_endpoint_erfa.csv"
GENERATOR_STATE = 20_261_202_17  # arbitrary fixed integer
LAST_OBSERVED_MJD = 61335
OBSERVED_ROWS = 12
PREDICTED_ROWS = 4


def main():
    rows = []
    for line in SOURCE.read_text().splitlines():
        f = line.split(",")
        if f[0] == "interp" and float(f[2]) < 86400.0:
            rows.append((int(f[1]), float(f[2]), float(f[3]), float(f[4]), float(f[5])))
    rng = random.Random(GENERATOR_STATE)
    observed = [r for r in rows if r[0] <= LAST_OBSERVED_MJD]
    predicted = [r for r in rows if r[0] > LAST_OBSERVED_MJD + 1]
    chosen = sorted(rng.sample(observed, OBSERVED_ROWS) + rng.sample(predicted, PREDICTED_ROWS))
    lines = [
        f"# Earth orientation from pyerfa {erfa.__version__} (ERFA {erfa.version.erfa_version}) "
        "at UTC instants of eop_interp_reference.csv, with its UT1 - UTC, x_p, y_p",
        "# made by tests/reference/make_orientation_endpoint_reference.py; angles in radians; "
        "era00, gmst06, gst06a, xys06a, sp00, c2t06a (GCRS -> ITRS)",
        "utc_iso,utc_mjd,sod_s,ut1_utc_s,xp_arcsec,yp_arcsec,era,gmst,gast,x,y,s,sp,"
        "m11,m12,m13,m21,m22,m23,m31,m32,m33",
    ]
    for mjd, sod, dut1, xp_as, yp_as in chosen:
        nanos = round(sod * 1e9)
        sod = nanos / 1e9
        whole, frac = divmod(nanos, 10**9)
        hour, rest = divmod(whole, 3600)
        minute, second = divmod(rest, 60)
        year, month, day, _ = erfa.jd2cal(2400000.5, float(mjd))
        iso = f"{int(year):04d}-{int(month):02d}-{int(day):02d}T{hour:02d}:{minute:02d}:{second:02d}.{frac:09d}"
        utc1, utc2 = erfa.dtf2d("UTC", int(year), int(month), int(day), hour, minute,
                                second + frac / 1e9)
        tt1, tt2 = erfa.taitt(*erfa.utctai(utc1, utc2))
        ut11, ut12 = erfa.utcut1(utc1, utc2, dut1)
        xp, yp = xp_as * erfa.DAS2R, yp_as * erfa.DAS2R
        era = float(erfa.era00(ut11, ut12))
        gmst = float(erfa.gmst06(ut11, ut12, tt1, tt2))
        gast = float(erfa.gst06a(ut11, ut12, tt1, tt2))
        x, y, s = (float(v) for v in erfa.xys06a(tt1, tt2))
        sp = float(erfa.sp00(tt1, tt2))
        matrix = erfa.c2t06a(tt1, tt2, ut11, ut12, xp, yp)
        values = [dut1, xp_as, yp_as, era, gmst, gast, x, y, s, sp]
        values += [float(matrix[i][j]) for i in range(3) for j in range(3)]
        lines.append(f"{iso},{mjd},{sod!r}," + ",".join(repr(float(v)) for v in values))
    OUT.write_text("\n".join(lines) + "\n")
    print(f"wrote {len(chosen)} rows to {OUT}")


if __name__ == "__main__":
    main()
