#!/usr/bin/env python3
"""Reference values of the EGM2008 potential (degree 120) for src/physics/earth/geopotential.rs,
computed apart from the service's recursion: every associated Legendre function from its
explicit polynomial (Rodrigues' formula differentiated m times, Heiskanen & Moritz 1967 eqs.
1-62 and 1-60: P_nm(t) = (1 - t^2)^(m/2) 2^-n sum_k (-1)^k C(n, k) C(2n - 2k, n)
(n - 2k)!/(n - 2k - m)! t^(n - 2k - m)), evaluated in mpmath at 120 significant digits (the
alternating terms reach 1e71 at degree 120), with the geodetic full normalization
sqrt((2 - delta_m0)(2n + 1)(n - m)!/(n + m)!) (eq. 1-73), summed over the coefficients of
src/physics/earth/data/egm2008_degree120.gfc.

    pip install mpmath==1.3.0
    python3 tests/reference/make_egm2008_reference.py > tests/reference/egm2008_potential_reference.csv

Points: seeded (random.Random(20261204)): 5 on the ground (GRS80 geodetic latitude, longitude,
height -100 .. 3000 m) and 3 in orbit (geocentric radius 6 778 .. 42 164 km), two at a time. Columns: the ITRS
position (m) and V (m^2/s^2) to degree 2, 12 and 120.
"""
import math
import multiprocessing
import random

import mpmath

mpmath.mp.dps = 120
DATA = "src/physics/earth/data/egm2008_degree120.gfc"
A_GRS80 = 6378137.0
F_GRS80 = 1 / 298.257222101


def read():
    gm = radius = None
    coeffs = {}
    head = True
    for line in open(DATA):
        f = line.split()
        if head:
            if f[0] == "earth_gravity_constant":
                gm = mpmath.mpf(f[1].replace("d", "e").replace("D", "e"))
            if f[0] == "radius":
                radius = mpmath.mpf(f[1].replace("d", "e").replace("D", "e"))
            if f[0] == "end_of_head":
                head = False
            continue
        n, m = int(f[0]), int(f[1])
        c, s = (mpmath.mpf(v.replace("d", "e").replace("D", "e")) for v in f[2:4])
        coeffs[(n, m)] = (c, s)
    return gm, radius, coeffs


def geodetic(lat_deg, lon_deg, h):
    e2 = F_GRS80 * (2 - F_GRS80)
    lat, lon = math.radians(lat_deg), math.radians(lon_deg)
    n = A_GRS80 / math.sqrt(1 - e2 * math.sin(lat) ** 2)
    return [(n + h) * math.cos(lat) * math.cos(lon), (n + h) * math.cos(lat) * math.sin(lon),
            (n * (1 - e2) + h) * math.sin(lat)]


def legendre(n, m, t, u):
    """Fully normalized P_nm(t), u = sqrt(1 - t^2), from the explicit polynomial."""
    total = mpmath.mpf(0)
    for k in range((n - m) // 2 + 1):
        total += ((-1) ** k * math.comb(n, k) * math.comb(2 * n - 2 * k, n)
                  * (math.factorial(n - 2 * k) // math.factorial(n - 2 * k - m))
                  * t ** (n - 2 * k - m))
    norm = mpmath.sqrt(mpmath.mpf((1 if m == 0 else 2) * (2 * n + 1)
                                  * math.factorial(n - m)) / math.factorial(n + m))
    return norm * u ** m * total / mpmath.mpf(2) ** n


def potentials(args):
    """V to degree 2, 12 and 120 at one point: each function once, summed by degree."""
    gm, radius, coeffs, xyz = args
    x, y, z = (mpmath.mpf(v) for v in xyz)
    r = mpmath.sqrt(x * x + y * y + z * z)
    t = z / r
    u = mpmath.sqrt(x * x + y * y) / r
    lam = mpmath.atan2(y, x)
    totals = {2: mpmath.mpf(0), 12: mpmath.mpf(0), 120: mpmath.mpf(0)}
    for (n, m), (c, s) in coeffs.items():
        p = legendre(n, m, t, u)
        term = (radius / r) ** n * p * (c * mpmath.cos(m * lam) + s * mpmath.sin(m * lam))
        for degree in totals:
            if n <= degree:
                totals[degree] += term
    return [gm / r * totals[d] for d in (2, 12, 120)]


def main():
    gm, radius, coeffs = read()
    rng = random.Random(20261204)
    points = []
    for _ in range(5):
        points.append(geodetic(rng.uniform(-89.0, 89.0), rng.uniform(-180.0, 180.0),
                               rng.uniform(-100.0, 3000.0)))
    for _ in range(3):
        r = rng.uniform(6_778_000.0, 42_164_000.0)
        lat, lon = math.radians(rng.uniform(-89.0, 89.0)), math.radians(rng.uniform(-180, 180))
        points.append([r * math.cos(lat) * math.cos(lon), r * math.cos(lat) * math.sin(lon),
                       r * math.sin(lat)])
    with multiprocessing.Pool(2) as pool:
        results = pool.map(potentials, [(gm, radius, coeffs, p) for p in points])
    print("x_m,y_m,z_m,v2_m2_s2,v12_m2_s2,v120_m2_s2")
    for p, values in zip(points, results):
        print(",".join(repr(v) for v in p) + "," + ",".join(mpmath.nstr(v, 20) for v in values))


if __name__ == "__main__":
    main()
