#!/usr/bin/env python3
"""UTC -> TDB for one million epochs: eigenzeit against ERFA (pyerfa), time and agreement.

The same epochs (deterministic, 1972-01-01 to 2100-12-31, whole nanoseconds of a UTC day)
go to both sides as binary arrays; neither side's timing includes text or file I/O.

- ERFA, vectorised: erfa.utctai -> erfa.taitt -> erfa.dtdb (geocentric: u = v = 0) ->
  erfa.tttdb, on two-part quasi-JDs (on a day that ends with a leap second the fraction is
  seconds / 86 401, the ERFA convention).
- eigenzeit, one release process (examples/convert_many.rs): UTC reading -> instant (through
  the leap-second table) -> TAI -> TT -> TDB, geocentric, with the fitted (default) and the
  full 787-term TDB - TT series.

Each side runs REPEATS times; the best time counts. The agreement is measured on TDB - UTC in
seconds: for ERFA, dat + 32.184 s + dtr, the values its chain adds (a two-part JD rounds the
day fraction to ~1e-11 s, so differencing JDs would hide picoseconds); for eigenzeit, the
exact attosecond offset it wrote. The whole seconds are compared apart from the fraction.

Usage: python3 bench/against_erfa.py [--epochs N] [--repeats R] [--skip-build]
Environment: CARGO_TARGET_DIR (where the release example is built).
"""

import argparse
import json
import os
import subprocess
import sys
import tempfile
import time
import warnings

import erfa
import numpy as np

FIRST_MJD = 41317  # 1972-01-01
END_MJD = 88434  # 2101-01-01 (exclusive)
NS_PER_DAY = 86_400 * 10**9
SEED = 20_260_314


def make_epochs(count):
    """Deterministic UTC epochs: (MJD day, nanoseconds of day below 86 400 s)."""
    rng = np.random.default_rng(SEED)
    mjd = rng.integers(FIRST_MJD, END_MJD, size=count, dtype=np.int64)
    ns = rng.integers(0, NS_PER_DAY, size=count, dtype=np.int64)
    return mjd, ns


def tai_minus_utc(mjd):
    """ERFA's TAI - UTC (whole seconds from 1972) at 0h UTC of each day."""
    iy, im, iday, _ = erfa.jd2cal(2400000.5, mjd.astype(np.float64))
    return erfa.dat(iy, im, iday, 0.0)


def erfa_chain(utc1, utc2):
    tai1, tai2 = erfa.utctai(utc1, utc2)
    tt1, tt2 = erfa.taitt(tai1, tai2)
    dtr = erfa.dtdb(tt1, tt2, 0.0, 0.0, 0.0, 0.0)
    tdb1, tdb2 = erfa.tttdb(tt1, tt2, dtr)
    return tdb1, tdb2, dtr


def best_of(repeats, function, *args):
    times = []
    result = None
    for _ in range(repeats):
        start = time.perf_counter()
        result = function(*args)
        times.append(time.perf_counter() - start)
    return min(times), times, result


def run_eigenzeit(root, binary, in_path, series, repeats):
    out_path = in_path + "." + series + ".out"
    line = subprocess.run(
        [binary, in_path, out_path, series, str(repeats)],
        check=True, capture_output=True, text=True, cwd=root,
    ).stdout.strip()
    report = json.loads(line)
    raw = np.fromfile(out_path, dtype="<i8").reshape(-1, 2)
    return report, raw[:, 0], raw[:, 1]


def main():
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--epochs", type=int, default=1_000_000)
    parser.add_argument("--repeats", type=int, default=3)
    parser.add_argument("--skip-build", action="store_true")
    args = parser.parse_args()
    warnings.simplefilter("ignore", erfa.ErfaWarning)  # "dubious year" past ERFA's table

    root = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    target = os.environ.get("CARGO_TARGET_DIR", os.path.join(root, "target"))
    binary = os.path.join(target, "release", "examples", "convert_many")
    if not args.skip_build:
        subprocess.run(["cargo", "build", "--release", "--quiet", "--example", "convert_many"],
                       check=True, cwd=root)

    mjd, ns = make_epochs(args.epochs)
    dat = tai_minus_utc(mjd)
    day_s = 86_400.0 + (tai_minus_utc(mjd + 1) - dat)  # 86 401 s before a leap second
    utc1 = 2400000.5 + mjd.astype(np.float64)
    utc2 = (ns / 1e9) / day_s

    erfa_s, erfa_runs, (tdb1, tdb2, dtr) = best_of(args.repeats, erfa_chain, utc1, utc2)

    with tempfile.TemporaryDirectory() as folder:
        in_path = os.path.join(folder, "epochs.bin")
        np.stack([mjd, ns], axis=1).astype("<i8").tofile(in_path)
        results = {s: run_eigenzeit(root, binary, in_path, s, args.repeats)
                   for s in ("fitted", "full")}

    # ERFA's TDB - UTC as the sum of what its chain adds: dat + 32.184 s + dtr.
    erfa_whole = dat.astype(np.int64) + 32
    erfa_fraction = 0.184 + dtr
    # The same from ERFA's two-part JDs (for information: limited by JD rounding).
    erfa_from_jd = ((tdb1 - utc1) + tdb2) * 86_400.0 - ns / 1e9

    n = args.epochs
    print(f"epochs: {n}, UTC 1972-01-01 .. 2100-12-31, seed {SEED}; best of {args.repeats}")
    print(f"ERFA (pyerfa {erfa.__version__}, vectorised utctai/taitt/dtdb/tttdb): "
          f"{erfa_s:.3f} s, {erfa_s / n * 1e9:.1f} ns/epoch  runs {[round(t, 3) for t in erfa_runs]}")
    for series, (report, whole, attos) in results.items():
        ours_s = report["best_s"]
        whole_difference = whole - erfa_whole
        difference = whole_difference + (attos * 1e-18 - erfa_fraction)
        worst = int(np.argmax(np.abs(difference)))
        jd_difference = (whole + attos * 1e-18) - erfa_from_jd
        print(f"eigenzeit ({series} TDB - TT series): {ours_s:.3f} s, "
              f"{ours_s / n * 1e9:.1f} ns/epoch  runs {report['runs_s']}; "
              f"ERFA/eigenzeit time per epoch: {erfa_s / ours_s:.1f}x")
        print(f"  TDB - UTC, eigenzeit - ERFA: max |d| = {abs(difference[worst]) * 1e12:.4f} ps "
              f"(MJD {mjd[worst]} + {ns[worst]} ns), rms = "
              f"{np.sqrt(np.mean(difference ** 2)) * 1e12:.4f} ps; whole seconds differ on "
              f"{int(np.count_nonzero(whole_difference))} epochs")
        print(f"  (for information, from ERFA's two-part JDs: max |d| = "
              f"{np.max(np.abs(jd_difference)) * 1e12:.1f} ps, the JD rounding)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
