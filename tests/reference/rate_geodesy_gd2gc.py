#!/usr/bin/env python3
"""Reference GRS80 geodetic -> geocentric (ECEF) positions for the unit tests in
src/physics/geodesy.rs, computed with ERFA's eraGd2gc through the pyerfa package (n = 2: GRS80).

Run: python3 tests/reference/rate_geodesy_gd2gc.py  (pyerfa from PyPI)
The printed lines are pasted into the test `geodetic_to_ecef_matches_erfa_gd2gc`.
"""
import math

import erfa

SITES = [
    # (latitude_deg, longitude_deg, height_m): invented points spread over the ellipsoid
    (0.0, 0.0, 0.0),
    (45.0, 10.0, 250.0),
    (-33.5, -70.25, 1500.0),
    (89.9, 135.0, -20.0),
    (52.0, 359.5, 8848.0),
]

for lat, lon, h in SITES:
    xyz = erfa.gd2gc(2, math.radians(lon), math.radians(lat), h)
    print(f"(({lat!r}, {lon!r}, {h!r}), [{float(xyz[0])!r}, {float(xyz[1])!r}, {float(xyz[2])!r}]),")
