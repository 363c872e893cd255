#!/usr/bin/env python3
"""Extract the Fairhead & Bretagnon (1990) TDB - TT series from ERFA's dtdb.c.

The coefficient table is published numerical data (Fairhead, L. & Bretagnon, P., 1990,
Astron. Astrophys. 229, 240-247). A machine-readable copy is tabulated in ERFA's C source
`liberfa/erfa/src/dtdb.c`, which ships in the source distribution of the `pyerfa` package
(BSD-3-Clause). Get that tarball with:

    pip download --no-binary pyerfa --no-deps pyerfa

and run:

    python3 tools/extract_fairhead_bretagnon.py path/to/pyerfa-X.Y.Z.tar.gz

It writes:
  src/physics/time/data/fairhead_bretagnon_1990.txt  the 787 terms and the planetary-mass
                                                      adjustment terms, as ERFA evaluates them
  src/physics/time/data/LICENSE-ERFA.txt             ERFA's licence notice, copied verbatim

Numbers are copied as the text of the C literals (not re-formatted), so the Rust parser
rounds exactly the same decimal strings that the C compiler rounded.
"""

import argparse
import pathlib
import re
import sys
import tarfile

REPO_ROOT = pathlib.Path(__file__).resolve().parent.parent
DATA_DIR = REPO_ROOT / "src" / "physics" / "time" / "data"

# Block sizes in dtdb.c (comment above the table and the loops that sum it):
# sets 1-474 multiply T**0, 475-679 T**1, 680-764 T**2, 765-784 T**3, 785-787 T**4.
BLOCKS = [(0, 474), (1, 205), (2, 85), (3, 20), (4, 3)]

NUMBER = r"[-+]?(?:\d+\.\d*|\.\d+|\d+)(?:[eE][-+]?\d+)?"
TERM_RE = re.compile(r"\{\s*(%s)\s*,\s*(%s)\s*,\s*(%s)\s*\}" % (NUMBER, NUMBER, NUMBER))
# One planetary-mass adjustment term: "[(-]A * sin(F * t + P)".
WJ_SIN_RE = re.compile(
    r"\(?\s*(-?)\s*(%s)\s*\*\s*sin\(\s*(%s)\s*\*\s*t\s*\+\s*(%s)\s*\)" % (NUMBER, NUMBER, NUMBER)
)
WJ_POLY_RE = re.compile(r"(%s)\s*\*\s*t\s*\*\s*t\s*;" % NUMBER)


def read_member(tar: tarfile.TarFile, suffix: str) -> str:
    for member in tar.getmembers():
        if member.name.endswith(suffix):
            handle = tar.extractfile(member)
            if handle is None:
                break
            return handle.read().decode("utf-8")
    sys.exit(f"error: no member ending in {suffix!r} in the tarball")


def parse_table(source: str):
    start = source.index("static const double fairhd[787][3]")
    end = source.index("};", start)
    terms = TERM_RE.findall(source[start:end])
    if len(terms) != sum(n for _, n in BLOCKS):
        sys.exit(f"error: expected 787 terms, found {len(terms)}")
    rows = []
    index = 0
    for power, count in BLOCKS:
        for _ in range(count):
            rows.append((power,) + terms[index])
            index += 1
    return rows


def parse_adjustment(source: str):
    start = source.index("wj =")
    end = source.index(";", start) + 1
    text = source[start:end]
    sines = []
    for sign, amplitude, frequency, phase in WJ_SIN_RE.findall(text):
        sines.append((sign + amplitude, frequency, phase))
    poly = WJ_POLY_RE.findall(text)
    if len(sines) != 4 or len(poly) != 1:
        sys.exit(f"error: unexpected planetary-mass adjustment expression: {text!r}")
    return sines, poly[0]


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("tarball", help="pyerfa source distribution (.tar.gz)")
    args = parser.parse_args()

    with tarfile.open(args.tarball, "r:gz") as tar:
        source = read_member(tar, "liberfa/erfa/src/dtdb.c")
        licence = read_member(tar, "liberfa/erfa/LICENSE")
    sdist_name = pathlib.Path(args.tarball).name

    rows = parse_table(source)
    sines, poly = parse_adjustment(source)

    lines = [
        "# TDB - TT: Fairhead, L. & Bretagnon, P. (1990), Astron. Astrophys. 229, 240-247,",
        "# in its full form (787 terms), as tabulated in ERFA's dtdb.c (eraDtdb), together with",
        "# ERFA's adjustment for JPL planetary masses. Extracted from liberfa/erfa/src/dtdb.c in",
        f"# {sdist_name} by tools/extract_fairhead_bretagnon.py; do not edit by hand.",
        "# ERFA is BSD-3-Clause: see LICENSE-ERFA.txt beside this file.",
        "#",
        "# Time argument: T = Julian millennia (365250 days) since J2000.0 (JD 2451545.0 TDB).",
        "# TDB - TT (s) = sum over FB rows of amplitude * T^power * sin(frequency * T + phase)",
        "#              + sum over ADJ rows of amplitude * sin(frequency * T + phase)",
        "#              + sum over POLY rows of amplitude * T^power",
        "# FB rows are in table order; ERFA sums each power block from its last row to its first.",
        "#",
        "# kind power amplitude_s frequency_rad_per_julian_millennium phase_rad",
    ]
    for power, amplitude, frequency, phase in rows:
        lines.append(f"FB {power} {amplitude} {frequency} {phase}")
    for amplitude, frequency, phase in sines:
        lines.append(f"ADJ 0 {amplitude} {frequency} {phase}")
    lines.append(f"POLY 2 {poly} 0 0")

    DATA_DIR.mkdir(parents=True, exist_ok=True)
    (DATA_DIR / "fairhead_bretagnon_1990.txt").write_text("\n".join(lines) + "\n")
    header = (
        "ERFA licence notice, copied verbatim from liberfa/erfa/LICENSE in "
        f"{sdist_name}.\nIt covers fairhead_bretagnon_1990.txt, extracted from ERFA's dtdb.c.\n\n"
    )
    (DATA_DIR / "LICENSE-ERFA.txt").write_text(header + licence)
    print(f"wrote {len(rows)} series terms, {len(sines)} + 1 adjustment terms to {DATA_DIR}")


if __name__ == "__main__":
    main()
