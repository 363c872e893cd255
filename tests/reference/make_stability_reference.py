#!/usr/bin/env python3
"""Reference values for the clock-stability library (src/physics/stability/), from
general-purpose libraries: allantools (deviations, noise identification, EDF of the overlapping
Allan variance) and scipy (chi-squared quantiles).

    pip install allantools numpy scipy
    python3 tests/reference/make_stability_reference.py

Writes tests/reference/stability_allantools.csv and tests/reference/chi_squared_scipy.csv.
The random series are made here with a seeded generator (numpy PCG64, seeds below) and written
into the CSV with 17 significant digits, so the Rust test reads exactly the same data.
"""
import csv
import os

import allantools
import numpy as np
import scipy
from scipy.stats import chi2

HERE = os.path.dirname(os.path.abspath(__file__))
FUNCS = {
    "adev": allantools.adev,
    "oadev": allantools.oadev,
    "mdev": allantools.mdev,
    "tdev": allantools.tdev,
    "hdev": allantools.hdev,
    "ohdev": allantools.ohdev,
    "totdev": allantools.totdev,
}


def series():
    """(name, kind, tau0_s, values): white FM, random-walk FM and white PM series."""
    rng = np.random.Generator(np.random.PCG64(20261204))
    white_fm = 1e-12 * rng.standard_normal(400)
    yield "white_fm_freq", "frequency", 30.0, white_fm
    rw_fm = 1e-14 * np.cumsum(rng.standard_normal(400))
    yield "rw_fm_freq", "frequency", 1.0, rw_fm
    white_pm = 1e-9 * rng.standard_normal(301)
    yield "white_pm_phase", "phase", 10.0, white_pm
    walk = 1e-9 * np.cumsum(rng.standard_normal(257))
    yield "walk_phase", "phase", 1.0, walk


def main():
    rows = []
    for name, kind, tau0, values in series():
        data_type = "phase" if kind == "phase" else "freq"
        n_phase = len(values) + (1 if kind == "frequency" else 0)
        for dev, func in FUNCS.items():
            taus, devs, _, ns = func(values, rate=1.0 / tau0, data_type=data_type, taus="octave")
            for tau, value, terms in zip(taus, devs, ns):
                rows.append([name, dev, repr(float(tau)), repr(float(value)), int(terms)])
        # EDF of the overlapping Allan variance (Howe, Allan, Barnes) for each noise type.
        for alpha in (2, 1, 0, -1, -2):
            for m in (1, 2, 4, 8):
                edf = allantools.edf_simple(n_phase, m, alpha)
                rows.append([name, f"edf_alpha{alpha}", repr(float(m)), repr(float(edf)), n_phase])
    with open(os.path.join(HERE, "stability_allantools.csv"), "w", newline="") as out:
        w = csv.writer(out, lineterminator="\n")
        w.writerow([f"# allantools {allantools.__version__} numpy {np.__version__}"])
        w.writerow(["series", "deviation", "tau_s", "value", "terms"])
        w.writerows(rows)
    with open(os.path.join(HERE, "stability_series.csv"), "w", newline="") as out:
        w = csv.writer(out, lineterminator="\n")
        w.writerow(["series", "kind", "tau0_s", "values"])
        for name, kind, tau0, values in series():
            w.writerow([name, kind, repr(tau0), " ".join(f"{v:.17g}" for v in values)])
    with open(os.path.join(HERE, "chi_squared_scipy.csv"), "w", newline="") as out:
        w = csv.writer(out, lineterminator="\n")
        w.writerow([f"# scipy {scipy.__version__} scipy.stats.chi2.ppf"])
        w.writerow(["p", "nu", "quantile"])
        for nu in (1.0, 1.5, 2.0, 3.7, 10.0, 30.0, 100.0, 997.0, 1e5):
            for p in (0.0005, 0.025, 0.1585, 0.5, 0.8415, 0.975, 0.9995):
                w.writerow([repr(p), repr(nu), repr(float(chi2.ppf(p, nu)))])


if __name__ == "__main__":
    main()
