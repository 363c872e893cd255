#!/usr/bin/env python3
"""Reference values of TDB - TT from pyerfa's `erfa.dtdb` (ERFA eraDtdb).

Writes tests/reference/tdb_minus_tt_erfa.csv, read by the tests of
src/physics/time/tdb_series. Run from anywhere:

    python3 tests/reference/make_tdb_reference.py

Epochs: TT seconds since J2000.0, drawn uniformly over 1960-01-01 .. 2100-01-01 by a
pseudo-random generator with a fixed initial state (so the file is reproducible), plus a few
fixed epochs. UT1 day fractions are drawn independently in [0, 1): they are just inputs of the
topocentric terms. One row in three is geocentric (empty x, y, z: no observer, u = v = 0 for
ERFA); the others carry an invented observer location as ITRF x, y, z in metres (points on
the GRS80 ellipsoid at random latitude and longitude, heights -100 m .. 5000 m).

ERFA is called with date1 = 2451545.0 and date2 = tt_since_j2000_s / 86400 (the "J2000
method" of eraDtdb note 1), with TT in place of TDB as eraDtdb note 1 allows; elong, u, v are
formed as ERFA users do: elong = atan2(y, x), u = hypot(x, y) / 1000 km, v = z / 1000 km.
Numbers are written with repr(), which round-trips doubles exactly.
"""

import math
import pathlib
import random

import erfa
import erfa.version

OUT = pathlib.Path(__file__).resolve().parent / "tdb_minus_tt_erfa.csv"

SECONDS_PER_DAY = 86400.0
# TT seconds since J2000.0 of 1960-01-01T00:00 TT and 2100-01-01T00:00 TT (proleptic Gregorian:
# JD 2436934.5 and JD 2488069.5).
START_S = (2436934.5 - 2451545.0) * SECONDS_PER_DAY
END_S = (2488069.5 - 2451545.0) * SECONDS_PER_DAY
ROW_COUNT = 3000
GENERATOR_STATE = 19_900_229  # arbitrary fixed integer

# GRS80 (Moritz, Geodetic Reference System 1980).
A_M = 6378137.0
F = 1.0 / 298.257222101
E2 = F * (2.0 - F)


def geodetic_to_itrf_m(lat_rad, lon_rad, height_m):
    """Geodetic latitude, longitude, ellipsoidal height -> ITRF x, y, z (m), GRS80."""
    n = A_M / math.sqrt(1.0 - E2 * math.sin(lat_rad) ** 2)
    x = (n + height_m) * math.cos(lat_rad) * math.cos(lon_rad)
    y = (n + height_m) * math.cos(lat_rad) * math.sin(lon_rad)
    z = (n * (1.0 - E2) + height_m) * math.sin(lat_rad)
    return x, y, z


def main():
    rng = random.Random(GENERATOR_STATE)
    epochs = [0.0, START_S, END_S, -0.5 * SECONDS_PER_DAY, 86400.0 * 9131.25]
    epochs += [rng.uniform(START_S, END_S) for _ in range(ROW_COUNT - len(epochs))]

    lines = [
        f"# TDB - TT from pyerfa {erfa.__version__} (ERFA {erfa.version.erfa_version}) erfa.dtdb",
        "# made by tests/reference/make_tdb_reference.py; date1 = 2451545.0, "
        "date2 = tt_since_j2000_s / 86400",
        "# x_m,y_m,z_m empty: geocentric (u = v = 0); else observer ITRF position, "
        "elong = atan2(y,x), u = hypot(x,y)/1000, v = z/1000",
        "tt_since_j2000_s,ut1_day_fraction,x_m,y_m,z_m,tdb_minus_tt_s",
    ]
    for index, tt_s in enumerate(epochs):
        ut1 = rng.random()
        date2 = tt_s / SECONDS_PER_DAY
        if index % 3 == 0:
            value = erfa.dtdb(2451545.0, date2, ut1, 0.0, 0.0, 0.0)
            lines.append(f"{tt_s!r},{ut1!r},,,,{float(value)!r}")
        else:
            lat = math.asin(rng.uniform(-1.0, 1.0))
            lon = rng.uniform(-math.pi, math.pi)
            height = rng.uniform(-100.0, 5000.0)
            x, y, z = geodetic_to_itrf_m(lat, lon, height)
            elong = math.atan2(y, x)
            u_km = math.hypot(x, y) / 1000.0
            v_km = z / 1000.0
            value = erfa.dtdb(2451545.0, date2, ut1, elong, u_km, v_km)
            lines.append(f"{tt_s!r},{ut1!r},{x!r},{y!r},{z!r},{float(value)!r}")
    OUT.write_text("\n".join(lines) + "\n")
    print(f"wrote {len(epochs)} rows to {OUT}")


if __name__ == "__main__":
    main()
