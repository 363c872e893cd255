#!/usr/bin/env python3
"""Writes the invented demo scenario's ephemerides (see README.md).

Propagator: two-body Kepler orbits with the secular J2 drift of the ascending node, the argument
of perigee and the mean anomaly (e.g. Vallado, Fundamentals of Astrodynamics and Applications,
4th ed., eq. 9-41; Kozai 1959). Constants: IERS Conventions (2010) table 1.1.

Outputs (one day, 2026-05-20):
  lyra_kestrel.oem  CCSDS OEM 2.0 KVN, GCRF, UTC; Lyra every 300 s, Kestrel-1 every 60 s.
  lyra.sp3          SP3-d, Earth-fixed, GPS time, 15-min steps, positions only (Lyra).

The Earth-fixed positions turn the inertial ones by the Earth rotation angle only
(IERS Conventions (2010) eq. 5.15 with UT1 = UTC); precession, nutation and polar motion are
left out. That is enough for a demo of clock rates (which depend on |r|, z and the speed) but
not a realization of ITRF.

Usage: python3 make_demo_ephemerides.py [output directory]
"""
import math
import os
import sys

import numpy as np

GM = 3.986004418e14          # m^3/s^2, IERS Conventions (2010) table 1.1
J2 = 1.0826359e-3            # IERS Conventions (2010) table 1.1
RE = 6378136.6               # m, IERS Conventions (2010) table 1.1
DAY = "2026-05-20"
MJD_UTC = 61180              # 2026-05-20
GPS_MINUS_UTC_S = 18         # 37 s (TAI - UTC, IERS Bulletin C) - 19 s (TAI - GPST, IS-GPS-200)

# Invented scenario: the Lyra navigation constellation (two planes of three) and Kestrel-1.
LYRA_A_M = 27_977_000.0
SATELLITES = [
    # name, object id, a (m), e, i (deg), node (deg), perigee (deg), mean anomaly (deg), step (s)
    ("LYR-01", "2026-901A", LYRA_A_M, 0.0040, 56.0, 20.0, 30.0, 0.0, 300),
    ("LYR-02", "2026-901B", LYRA_A_M, 0.0120, 56.0, 20.0, 75.0, 120.0, 300),
    ("LYR-03", "2026-901C", LYRA_A_M, 0.0020, 56.0, 20.0, 200.0, 240.0, 300),
    ("LYR-04", "2026-902A", LYRA_A_M, 0.0080, 56.0, 200.0, 10.0, 60.0, 300),
    ("LYR-05", "2026-902B", LYRA_A_M, 0.0150, 56.0, 200.0, 140.0, 180.0, 300),
    ("LYR-06", "2026-902C", LYRA_A_M, 0.0060, 56.0, 200.0, 300.0, 300.0, 300),
    ("KESTREL-1", "2026-903A", RE + 450_000.0, 0.0040, 97.2, 110.0, 90.0, 0.0, 60),
]


def kepler_state(a, e, inc, node0, perigee0, mean0, t):
    """Position (m) and velocity (m/s) in the inertial frame at t seconds (J2 secular drift)."""
    n = math.sqrt(GM / a**3)
    p = a * (1 - e * e)
    k = 1.5 * n * J2 * (RE / p) ** 2
    node_rate = -k * math.cos(inc)
    perigee_rate = 0.5 * k * (5 * math.cos(inc) ** 2 - 1)
    mean_rate = n + 0.5 * k * math.sqrt(1 - e * e) * (3 * math.cos(inc) ** 2 - 1)
    node = node0 + node_rate * t
    perigee = perigee0 + perigee_rate * t
    mean = mean0 + mean_rate * t
    big_e = mean
    for _ in range(50):
        step = (big_e - e * math.sin(big_e) - mean) / (1 - e * math.cos(big_e))
        big_e -= step
        if abs(step) < 1e-15:
            break
    root = math.sqrt(1 - e * e)
    rate = mean_rate * a / (1 - e * math.cos(big_e))
    r_pf = np.array([a * (math.cos(big_e) - e), a * root * math.sin(big_e), 0.0])
    v_pf = np.array([-rate * math.sin(big_e), rate * root * math.cos(big_e), 0.0])
    co, so = math.cos(node), math.sin(node)
    ci, si = math.cos(inc), math.sin(inc)
    cw, sw = math.cos(perigee), math.sin(perigee)
    rot = np.array([
        [co * cw - so * sw * ci, -co * sw - so * cw * ci, so * si],
        [so * cw + co * sw * ci, -so * sw + co * cw * ci, -co * si],
        [sw * si, cw * si, ci],
    ])
    r = rot @ r_pf
    # The velocity is the time derivative of this position: motion along the orbit with the
    # drifting mean anomaly, plus the turning of the perigee (about the orbit normal) and of
    # the node (about the z axis).
    v = rot @ v_pf + perigee_rate * np.cross(rot[:, 2], r) + node_rate * np.cross([0, 0, 1.0], r)
    return r, v


def earth_rotation_angle(seconds_of_day_utc):
    """IERS Conventions (2010) eq. 5.15, UT1 taken equal to UTC."""
    tu = MJD_UTC + seconds_of_day_utc / 86400.0 - 51544.5
    return 2 * math.pi * ((0.7790572732640 + 1.00273781191135448 * tu) % 1.0)


def clock(seconds):
    h, rest = divmod(int(round(seconds)), 3600)
    m, s = divmod(rest, 60)
    return f"{h:02d}:{m:02d}:{s:02d}"


def write_oem(path):
    lines = [
        "CCSDS_OEM_VERS = 2.0",
        "COMMENT Invented demo scenario: Lyra navigation constellation and Kestrel-1",
        "COMMENT Two-body orbits with J2 secular drift, demo-data/make_demo_ephemerides.py",
        "CREATION_DATE = 2026-05-19T12:00:00.000",
        "ORIGINATOR = LYRA-DEMO-OPS",
    ]
    for name, object_id, a, e, inc, node, perigee, mean, step in SATELLITES:
        last = 86400 - step
        lines += [
            "",
            "META_START",
            f"OBJECT_NAME = {name}",
            f"OBJECT_ID = {object_id}",
            "CENTER_NAME = EARTH",
            "REF_FRAME = GCRF",
            "TIME_SYSTEM = UTC",
            f"START_TIME = {DAY}T00:00:00.000",
            f"STOP_TIME = {DAY}T{clock(last)}.000",
            "INTERPOLATION = HERMITE",
            "INTERPOLATION_DEGREE = 7",
            "META_STOP",
        ]
        for t in range(0, 86400, step):
            r, v = kepler_state(a, e, math.radians(inc), math.radians(node),
                                math.radians(perigee), math.radians(mean), float(t))
            lines.append(
                f"{DAY}T{clock(t)}.000 {r[0]/1e3:.6f} {r[1]/1e3:.6f} {r[2]/1e3:.6f} "
                f"{v[0]/1e3:.9f} {v[1]/1e3:.9f} {v[2]/1e3:.9f}")
    with open(path, "w", encoding="ascii") as handle:
        handle.write("\n".join(lines) + "\n")


def write_sp3(path):
    lyra = [s for s in SATELLITES if s[0].startswith("LYR")]
    ids = [f"L{k + 1:02d}" for k in range(len(lyra))]
    epochs = 96
    lines = [
        f"#dP2026  5 20  0  0  0.00000000 {epochs:7d} ORBIT IGS20 KEP  LYR",
        "## 2419 259200.00000000   900.00000000 61180 0.0000000000000",
    ]
    padded = ids + ["  0"] * (17 * 5 - len(ids))
    for row in range(5):
        head = f"+  {len(ids):3d}   " if row == 0 else "+        "
        lines.append(head + "".join(padded[17 * row:17 * row + 17]))
    for _ in range(5):
        lines.append("++       " + "  0" * 17)
    lines += [
        "%c L  cc GPS ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc",
        "%c cc cc ccc ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc",
        "%f  1.2500000  1.025000000  0.00000000000  0.000000000000000",
        "%f  0.0000000  0.000000000  0.00000000000  0.000000000000000",
        "%i    0    0    0    0      0      0      0      0         0",
        "%i    0    0    0    0      0      0      0      0         0",
        "/* Invented demo scenario: Lyra navigation constellation",
        "/* L01..L06 are LYR-01..LYR-06; Earth-fixed by the Earth rotation",
        "/* angle only (no precession, nutation, polar motion): demo data",
        "/* written by demo-data/make_demo_ephemerides.py",
    ]
    for k in range(epochs):
        gps_s = 900 * k
        utc_s = gps_s - GPS_MINUS_UTC_S
        hh, mm = divmod(gps_s // 60, 60)
        lines.append(f"*  2026  5 20 {hh:2d} {mm:2d}  0.00000000")
        theta = earth_rotation_angle(utc_s)
        c, s = math.cos(theta), math.sin(theta)
        for sat_id, (name, _, a, e, inc, node, perigee, mean, _) in zip(ids, lyra):
            r, _ = kepler_state(a, e, math.radians(inc), math.radians(node),
                                math.radians(perigee), math.radians(mean), float(utc_s))
            x, y, z = (c * r[0] + s * r[1]) / 1e3, (-s * r[0] + c * r[1]) / 1e3, r[2] / 1e3
            lines.append(f"P{sat_id}{x:14.6f}{y:14.6f}{z:14.6f}{0.0:14.6f}")
    lines.append("EOF")
    with open(path, "w", encoding="ascii") as handle:
        handle.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    out = sys.argv[1] if len(sys.argv) > 1 else os.path.dirname(os.path.abspath(__file__))
    write_oem(os.path.join(out, "lyra_kestrel.oem"))
    write_sp3(os.path.join(out, "lyra.sp3"))
