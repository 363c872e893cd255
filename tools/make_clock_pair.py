#!/usr/bin/env python3
"""Writes an invented SP3 orbit + RINEX clock 3.04 pair with known clocks (pure Python 3).

Satellites L01-L04 of the invented Lyra constellation (see demo-data/README.md) on our own
two-body Kepler orbits; each clock is offset + rate * t (the "known clock", truth.csv) plus
the J2 periodic relativistic term -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u)
(Kouba 2004, GPS Solutions 8:170-180), computed here from the orbital angles; the
conventional term -2 r.v/c^2 is left out of the values, as in IGS clock products (common
practice). The Earth-fixed frame is the inertial one turned by omega_E t about z (no
precession, nutation, polar motion): invented data, not an ITRF realization.

Usage: python3 tools/make_clock_pair.py [directory]   (default tests/reference/clock_pair)
Deterministic: the clock parameters come from random.Random(20260520).
"""
import math
import os
import random
import sys

GM = 3.986004418e14          # IERS Conventions (2010) table 1.1
J2 = 1.0826359e-3            # IERS Conventions (2010) table 1.1
AE = 6378136.6               # IERS Conventions (2010) table 1.1
C = 299792458.0
OMEGA = 7.292115e-5          # rad/s, IERS Conventions (2010) table 1.1
DAY_S = 86400
ORBIT_STEP_S = 300
CLOCK_STEP_S = 30

# id, a (m), e, i (deg), node (deg), perigee (deg), mean anomaly at t=0 (deg)
SATELLITES = [
    ("L01", 27_977_000.0, 0.002, 56.0, 20.0, 30.0, 0.0),
    ("L02", 27_977_000.0, 0.015, 56.0, 20.0, 80.0, 120.0),
    ("L03", 27_977_000.0, 0.008, 56.0, 200.0, 150.0, 240.0),
    ("L04", 27_977_000.0, 0.011, 56.0, 200.0, 300.0, 60.0),
]


def kepler(a, e, i_deg, node_deg, perigee_deg, mean0_deg, t):
    """Inertial state and argument of latitude u (rad) at t seconds."""
    n = math.sqrt(GM / a**3)
    mean = math.radians(mean0_deg) + n * t
    ecc = mean
    for _ in range(50):
        step = (ecc - e * math.sin(ecc) - mean) / (1 - e * math.cos(ecc))
        ecc -= step
        if abs(step) < 1e-15:
            break
    nu = 2 * math.atan2(math.sqrt(1 + e) * math.sin(ecc / 2), math.sqrt(1 - e) * math.cos(ecc / 2))
    r = a * (1 - e * math.cos(ecc))
    p = a * (1 - e * e)
    h = math.sqrt(GM * p)
    u = math.radians(perigee_deg) + nu
    node, inc = math.radians(node_deg), math.radians(i_deg)
    cu, su, co, so, ci, si = math.cos(u), math.sin(u), math.cos(node), math.sin(node), math.cos(inc), math.sin(inc)
    pos = [r * (co * cu - so * su * ci), r * (so * cu + co * su * ci), r * su * si]
    vr = h * e * math.sin(nu) / p
    vt = h / r
    # d(pos)/dt = vr * pos/r + vt * (d pos-direction / du)
    du = [-co * su - so * cu * ci, -so * su + co * cu * ci, cu * si]
    vel = [vr * pos[k] / r + vt * du[k] for k in range(3)]
    return pos, vel, u


def j2_term(a, i_deg, u):
    """Kouba (2004): -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u), s."""
    return -1.5 * J2 * AE * AE / (C * C) * math.sqrt(GM / a**3) * math.sin(math.radians(i_deg)) ** 2 * math.sin(2 * u)


def earth_fixed(pos, vel, t):
    th = OMEGA * t
    c, s = math.cos(th), math.sin(th)
    r = [c * pos[0] + s * pos[1], -s * pos[0] + c * pos[1], pos[2]]
    v_rot = [c * vel[0] + s * vel[1], -s * vel[0] + c * vel[1], vel[2]]
    v = [v_rot[0] + OMEGA * r[1], v_rot[1] - OMEGA * r[0], v_rot[2]]  # v_EF = R v_I - omega x r
    return r, v


def epoch_fields(t):
    hour, rest = divmod(int(t), 3600)
    minute, second = divmod(rest, 60)
    return 2026, 5, 20, hour, minute, second


def main():
    out = sys.argv[1] if len(sys.argv) > 1 else "tests/reference/clock_pair"
    os.makedirs(out, exist_ok=True)
    rng = random.Random(20260520)
    params = {}
    for sat in SATELLITES:
        params[sat[0]] = (rng.uniform(-5e-4, 5e-4), rng.uniform(-5e-12, 5e-12))

    def clock(sat, t):
        sid, a, e, i, node, perigee, m0 = sat
        _, _, u = kepler(a, e, i, node, perigee, m0, t)
        offset, rate = params[sid]
        return offset + rate * t + j2_term(a, i, u)

    # SP3-d with velocities, 5-min steps, one day and the next midnight.
    epochs = list(range(0, DAY_S + 1, ORBIT_STEP_S))
    lines = [
        f"#dV2026  5 20  0  0  0.00000000 {len(epochs):7d} ORBIT IGS20 KEP  LYR",
        f"## 2419 259200.00000000   {ORBIT_STEP_S:3d}.00000000 61180 0.0000000000000",
        "+    4   L01L02L03L04" + "  0" * 13,
    ]
    lines += ["+        " + "  0" * 17] * 4
    lines += ["++       " + "  0" * 17] * 5
    lines += [
        "%c L  cc GPS ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc",
        "%c cc cc ccc ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc",
        "%f  1.2500000  1.025000000  0.00000000000  0.000000000000000",
        "%f  0.0000000  0.000000000  0.00000000000  0.000000000000000",
        "%i    0    0    0    0      0      0      0      0         0",
        "%i    0    0    0    0      0      0      0      0         0",
        "/* Invented demo scenario: Lyra navigation constellation",
        "/* known clocks (offset + rate t) plus the J2 periodic term",
        "/* Earth-fixed by omega_E t only: invented data",
        "/* written by tools/make_clock_pair.py",
    ]
    for t in epochs:
        y, mo, d, h, mi, s = epoch_fields(t) if t < DAY_S else (2026, 5, 21, 0, 0, 0)
        lines.append(f"*  {y:4d} {mo:2d} {d:2d} {h:2d} {mi:2d} {s:2d}.00000000")
        for sat in SATELLITES:
            pos, vel, _ = kepler(*sat[1:], t)
            r, v = earth_fixed(pos, vel, t)
            us = clock(sat, t) * 1e6
            lines.append(f"P{sat[0]}{r[0]/1e3:14.6f}{r[1]/1e3:14.6f}{r[2]/1e3:14.6f}{us:14.6f}")
            lines.append(f"V{sat[0]}{v[0]*10:14.6f}{v[1]*10:14.6f}{v[2]*10:14.6f}{0.0:14.6f}")
    lines.append("EOF")
    with open(os.path.join(out, "lyra_clock_pair.sp3"), "w") as f:
        f.write("\n".join(lines) + "\n")

    def header(content, label):
        return f"{content:<60}{label}"

    rin = [
        header("     3.04           C                   M", "RINEX VERSION / TYPE"),
        header("make_clock_pair.py  eigenzeit tools     20261204 000000 UTC", "PGM / RUN BY / DATE"),
        header("Invented Lyra clocks: offset + rate t + J2 periodic term", "COMMENT"),
        header("conventional -2 r.v/c^2 left out (IGS convention)", "COMMENT"),
        header("   GPS", "TIME SYSTEM ID"),
        header("     2    AR    AS", "# / TYPES OF DATA"),
        header("", "END OF HEADER"),
    ]
    for t in range(0, DAY_S, CLOCK_STEP_S):
        y, mo, d, h, mi, s = epoch_fields(t)
        stamp = f"{y:4d} {mo:02d} {d:02d} {h:02d} {mi:02d} {s:9.6f}"
        if t % 300 == 0:
            rin.append(f"AR TESSARO00 {stamp}  1   {-2.5e-9 + 1e-14 * t:19.12E}")
        for sat in SATELLITES:
            rin.append(f"AS {sat[0]:<9} {stamp}  1   {clock(sat, t):19.12E}")
    with open(os.path.join(out, "lyra_clock_pair.clk"), "w") as f:
        f.write("\n".join(rin) + "\n")

    with open(os.path.join(out, "truth.csv"), "w") as f:
        f.write("# known clocks of tools/make_clock_pair.py: clock - j2 = offset_s + rate * (t - 2026-05-20T00:00:00 GPST)\n")
        f.write("id,offset_s,rate\n")
        for sid, (offset, rate) in params.items():
            f.write(f"{sid},{offset!r},{rate!r}\n")


if __name__ == "__main__":
    main()
