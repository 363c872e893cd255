#!/usr/bin/env python3
"""Writes the invented lunar demo ephemeris tern_lunar.oem (see README.md).

Invented scenario: the Tern lunar relay pathfinder mission, two orbiters about the Moon.
  TERN-1  circular polar orbit 100 km above the 1737.4 km mean radius, states every 60 s.
  TERN-2  elliptical orbit a = 6541.4 km, e = 0.6, i = 56.2 deg, states every 300 s.
Two-body Kepler orbits about the Moon's point mass (GM of DE440, 4902.800118 km^3/s^2, Park
et al. 2021), elements referred to the ICRF equator; no J2, no Earth or Sun perturbation of the
orbit (the service adds those to the clock's rate, not to the path). One day from
2026-05-20T00:00:00 TDB.

CCSDS OEM 2.0 (KVN), CENTER_NAME = MOON, REF_FRAME = ICRF, TIME_SYSTEM = TDB; km and km/s.

Usage: python3 make_demo_lunar_ephemeris.py [output directory]
"""
import math
import os
import sys

GM_MOON = 4902.800118          # km^3/s^2, DE440 (Park et al. 2021)
R_MOON = 1737.4                # km, IAU WGCCRE (Archinal et al. 2018)
DAY = "2026-05-20"

ORBITERS = [
    # name, id, a (km), e, i (deg), node (deg), perigee (deg), mean anomaly (deg), step (s)
    ("TERN-1", "2026-951A", R_MOON + 100.0, 0.0, 90.0, 30.0, 0.0, 0.0, 60),
    ("TERN-2", "2026-951B", 6541.4, 0.6, 56.2, 120.0, 90.0, 180.0, 300),
]


def kepler_state(a, e, inc, node, perigee, mean_anomaly):
    """Position (km) and velocity (km/s) from Keplerian elements (angles in radians)."""
    big_e = mean_anomaly
    for _ in range(50):
        big_e -= (big_e - e * math.sin(big_e) - mean_anomaly) / (1.0 - e * math.cos(big_e))
    cos_e, sin_e = math.cos(big_e), math.sin(big_e)
    root = math.sqrt(1.0 - e * e)
    x, y = a * (cos_e - e), a * root * sin_e
    rate = math.sqrt(GM_MOON / a**3) / (1.0 - e * cos_e)
    vx, vy = -a * sin_e * rate, a * root * cos_e * rate
    co, so = math.cos(node), math.sin(node)
    cw, sw = math.cos(perigee), math.sin(perigee)
    ci, si = math.cos(inc), math.sin(inc)
    p = (co * cw - so * sw * ci, so * cw + co * sw * ci, sw * si)
    q = (-co * sw - so * cw * ci, -so * sw + co * cw * ci, cw * si)
    return ([x * p[k] + y * q[k] for k in range(3)], [vx * p[k] + vy * q[k] for k in range(3)])


def main():
    out = sys.argv[1] if len(sys.argv) > 1 else os.path.dirname(os.path.abspath(__file__))
    lines = [
        "CCSDS_OEM_VERS = 2.0",
        "COMMENT Invented demo scenario: the Tern lunar relay pathfinder (TERN-1, TERN-2)",
        "COMMENT Two-body orbits about the Moon, demo-data/make_demo_lunar_ephemeris.py",
        "CREATION_DATE = 2026-05-19T12:00:00.000",
        "ORIGINATOR = TERN-DEMO-OPS",
    ]
    for name, object_id, a, e, inc, node, perigee, m0, step in ORBITERS:
        n = math.sqrt(GM_MOON / a**3)
        count = 86400 // step
        last = count * step
        stop = f"{DAY}T{last // 3600 % 24:02d}:{last // 60 % 60:02d}:{last % 60:02d}.000"
        if last == 86400:
            stop = "2026-05-21T00:00:00.000"
        lines += [
            "",
            "META_START",
            f"OBJECT_NAME = {name}",
            f"OBJECT_ID = {object_id}",
            "CENTER_NAME = MOON",
            "REF_FRAME = ICRF",
            "TIME_SYSTEM = TDB",
            f"START_TIME = {DAY}T00:00:00.000",
            f"STOP_TIME = {stop}",
            "META_STOP",
        ]
        for k in range(count + 1):
            t = k * step
            mean = math.radians(m0) + n * t
            r, v = kepler_state(a, e, math.radians(inc), math.radians(node),
                                math.radians(perigee), mean)
            day = DAY if t < 86400 else "2026-05-21"
            stamp = f"{day}T{t // 3600 % 24:02d}:{t // 60 % 60:02d}:{t % 60:02d}.000"
            lines.append(stamp + " " + " ".join(f"{c:.6f}" for c in r) + " "
                         + " ".join(f"{c:.9f}" for c in v))
    with open(os.path.join(out, "tern_lunar.oem"), "w", encoding="ascii") as f:
        f.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
