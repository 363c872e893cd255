#!/usr/bin/env python3
"""Extract the IAU 2000A nutation, IAU 2006 CIO-locator and CIP X, Y series from ERFA's C sources.

The tables are published numerical data:
  - IAU 2000A nutation (MHB2000): Mathews, P.M., Herring, T.A. & Buffett, B.A. (2002),
    J. Geophys. Res. 107 (B4), 2068; IERS Conventions (2010) ch. 5, tables 5.3a and 5.3b
    (678 luni-solar and 687 planetary terms);
  - the series for s + XY/2 of IAU 2006/2000A: IERS Conventions (2010) ch. 5, table 5.2d
    (Capitaine, N. & Wallace, P.T. 2006, Astron. Astrophys. 450, 855);
  - the series for the CIP coordinates X, Y of IAU 2006/2000A: IERS Conventions (2010) ch. 5,
    tables 5.2a and 5.2b (Capitaine, N. & Wallace, P.T. 2006, Astron. Astrophys. 450, 855).
Machine-readable copies are tabulated in ERFA's `liberfa/erfa/src/nut00a.c`, `s06.c` and
`xy06.c`, which
ship in the source distribution of the `pyerfa` package (BSD-3-Clause). Get that tarball with:

    pip download --no-binary pyerfa --no-deps pyerfa

and run:

    python3 tools/extract_iau2006_series.py path/to/pyerfa-X.Y.Z.tar.gz

It writes, under src/physics/earth/orientation/data/:
  nutation_iau2000a_luni_solar.txt  678 rows: l l' F D Om  sp spt cp  ce cet se (0.1 uas)
  nutation_iau2000a_planetary.txt   687 rows: l F D Om Me Ve E Ma Ju Sa Ur Ne pA  sp cp se ce
  cio_locator_iau2006_s06.txt       the polynomial and the t^0..t^4 periodic terms of s + XY/2
  cip_xy_iau2006_xy06.txt           the polynomials of X, Y and their periodic terms per frequency
  LICENSE-ERFA.txt                  ERFA's licence notice, copied verbatim

Numbers are copied as the text of the C literals (not re-formatted), so the Rust parser rounds
exactly the same decimal strings that the C compiler rounded. Rows keep ERFA's table order.
"""

import argparse
import pathlib
import re
import sys
import tarfile

REPO_ROOT = pathlib.Path(__file__).resolve().parent.parent
DATA_DIR = REPO_ROOT / "src" / "physics" / "earth" / "orientation" / "data"

NUMBER = r"[-+]?(?:\d+\.\d*|\.\d+|\d+)(?:[eE][-+]?\d+)?"
BRACED_RE = re.compile(r"\{([^{}]*)\}")
NUMBER_RE = re.compile(NUMBER)


def read_member(tar: tarfile.TarFile, suffix: str) -> str:
    for member in tar.getmembers():
        if member.name.endswith(suffix):
            handle = tar.extractfile(member)
            if handle is None:
                break
            return handle.read().decode("utf-8")
    sys.exit(f"error: no member ending in {suffix!r} in the tarball")


def strip_comments(source: str) -> str:
    return re.sub(r"/\*.*?\*/", " ", source, flags=re.S)


def table_block(source: str, opening: str) -> str:
    """The text between `opening` ... `= {` and the matching `};`."""
    start = source.index(opening)
    start = source.index("= {", start) + 3
    end = source.index("};", start)
    return source[start:end]


def braced_rows(block: str, width: int, expected: int, name: str):
    rows = []
    # Rows of nut00a's luni-solar table and of s06 nest an inner brace for the integer
    # multipliers: flatten braces inside one row first.
    for match in BRACED_RE.finditer(block):
        rows.append(NUMBER_RE.findall(match.group(1)))
    if len(rows) != expected or any(len(r) != width for r in rows):
        sys.exit(f"error: {name}: expected {expected} rows of {width} numbers, got {len(rows)}")
    return rows


def s06_rows(block: str, name: str, expected: int):
    """s06 TERM rows: {{8 ints}, s, c}."""
    rows = re.findall(r"\{\s*\{([^{}]*)\}\s*,([^{}]*)\}", block)
    out = []
    for multipliers, amplitudes in rows:
        ints = NUMBER_RE.findall(multipliers)
        amps = NUMBER_RE.findall(amplitudes)
        if len(ints) != 8 or len(amps) != 2:
            sys.exit(f"error: {name}: bad row {multipliers!r} {amplitudes!r}")
        out.append(ints + amps)
    if len(out) != expected:
        sys.exit(f"error: {name}: expected {expected} rows, got {len(out)}")
    return out


def header(sdist_name: str, source_file: str, lines: list) -> list:
    return [
        *lines,
        f"# Extracted from liberfa/erfa/src/{source_file} in {sdist_name} by",
        "# tools/extract_iau2006_series.py; do not edit by hand. ERFA is BSD-3-Clause:",
        "# see LICENSE-ERFA.txt beside this file.",
        "#",
    ]


def write_xy06(xy06: str, sdist_name: str) -> None:
    """xy06.c: polynomials `xyp[2][6]` (arcsec), multipliers `mfals[][5]` and `mfapl[][14]`,
    pointers `nc[]` (1-based, one per frequency, luni-solar first) into amplitudes `a[]` (uas).
    Each frequency's amplitudes run from a[nc[i]-1] to a[nc[i+1]-2] (the last to the end of a[]);
    the k-th amplitude of a frequency is X or Y, sin or cos, t^p by ERFA's jaxy, jasc, japt."""
    polynomial = NUMBER_RE.findall(table_block(xy06, "static const double xyp"))
    if len(polynomial) != 12:
        sys.exit(f"error: xy06 xyp: expected 12 coefficients, got {len(polynomial)}")
    luni_solar = braced_rows(table_block(xy06, "static const int mfals"), 5, 653, "xy06 mfals")
    planetary = braced_rows(table_block(xy06, "static const int mfapl"), 14, 656, "xy06 mfapl")
    pointers = [int(n) for n in NUMBER_RE.findall(table_block(xy06, "static const int nc[]"))]
    amplitudes = NUMBER_RE.findall(table_block(xy06, "static const double a[]"))
    frequencies = len(luni_solar) + len(planetary)
    if len(pointers) != frequencies or len(amplitudes) != 4755:
        sys.exit(f"error: xy06: {len(pointers)} pointers, {len(amplitudes)} amplitudes")
    ends = pointers[1:] + [len(amplitudes) + 1]
    if pointers[0] != 1 or any(e - p < 1 or e - p > 20 for p, e in zip(pointers, ends)):
        sys.exit("error: xy06 nc: pointers not increasing by 1 to 20")
    lines = header(
        sdist_name,
        "xy06.c",
        [
            "# IAU 2006/2000A series for the CIP coordinates X, Y (IERS Conventions (2010)",
            "# tables 5.2a, 5.2b), as tabulated in ERFA's xy06.c (eraXy06), in ERFA's order.",
            "# POLY x|y power coefficient: the polynomial part in arcseconds, t^0 .. t^5.",
            "# LS l l' F D Om n a1 .. an: a luni-solar frequency and its n amplitudes (uas).",
            "# PL l l' F D Om Me Ve E Ma Ju Sa Ur Ne pA n a1 .. an: a planetary frequency.",
            "# The k-th amplitude of a frequency (k = 0..19) adds a_k t^japt[k] sc[jasc[k]] to",
            "# X (jaxy[k] = 0) or Y (1), sc = (sin, cos) of the argument, with ERFA's tables",
            "#   jaxy = 0 1 0 1 0 1 0 1 0 1 0 1 0 1 0 1 0 1 0 1",
            "#   jasc = 0 1 1 0 1 0 0 1 0 1 1 0 1 0 0 1 0 1 1 0",
            "#   japt = 0 0 0 0 1 1 1 1 2 2 2 2 3 3 3 3 4 4 4 4",
            "# X = (POLY x + (sum LS + sum PL) / 1e6) arcsec; ERFA sums from the last frequency",
            "# and, within one, from the last amplitude.",
        ],
    )
    for axis, offset in (("x", 0), ("y", 6)):
        for power in range(6):
            lines.append(f"POLY {axis} {power} {polynomial[offset + power]}")
    for index, (kind, row) in enumerate(
        [("LS", r) for r in luni_solar] + [("PL", r) for r in planetary]
    ):
        values = amplitudes[pointers[index] - 1 : ends[index] - 1]
        lines.append(f"{kind} " + " ".join(row) + f" {len(values)} " + " ".join(values))
    (DATA_DIR / "cip_xy_iau2006_xy06.txt").write_text("\n".join(lines) + "\n")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("tarball", help="pyerfa source distribution (.tar.gz)")
    args = parser.parse_args()

    with tarfile.open(args.tarball, "r:gz") as tar:
        nut00a = strip_comments(read_member(tar, "liberfa/erfa/src/nut00a.c"))
        s06 = strip_comments(read_member(tar, "liberfa/erfa/src/s06.c"))
        xy06 = strip_comments(read_member(tar, "liberfa/erfa/src/xy06.c"))
        licence = read_member(tar, "liberfa/erfa/LICENSE")
    sdist_name = pathlib.Path(args.tarball).name

    # nut00a.c luni-solar rows are "{ nl,nlp,nf,nd,nom, sp,spt,cp, ce,cet,se }".
    luni_solar = braced_rows(table_block(nut00a, "} xls[]"), 11, 678, "nut00a xls")
    # nut00a.c planetary rows are "{ nl,nf,nd,nom,nme,nve,nea,nma,nju,nsa,nur,nne,npa, sp,cp,se,ce }".
    planetary = braced_rows(table_block(nut00a, "} xpl[]"), 17, 687, "nut00a xpl")

    lines = header(
        sdist_name,
        "nut00a.c",
        [
            "# IAU 2000A nutation, luni-solar part (MHB2000; IERS Conventions (2010) table 5.3a),",
            "# as tabulated in ERFA's nut00a.c (eraNut00a), 678 terms in ERFA's order.",
            "# Units: 0.1 microarcsecond, and 0.1 microarcsecond per Julian century for spt, cet.",
            "# dpsi += (sp + spt t) sin(arg) + cp cos(arg); deps += (ce + cet t) cos(arg) + se sin(arg)",
            "# arg = nl l + nlp l' + nf F + nd D + nom Om (ERFA sums from the last row to the first).",
        ],
    )
    lines.append("# nl nlp nf nd nom sp spt cp ce cet se")
    lines += [" ".join(row) for row in luni_solar]
    DATA_DIR.mkdir(parents=True, exist_ok=True)
    (DATA_DIR / "nutation_iau2000a_luni_solar.txt").write_text("\n".join(lines) + "\n")

    lines = header(
        sdist_name,
        "nut00a.c",
        [
            "# IAU 2000A nutation, planetary part (MHB2000; IERS Conventions (2010) table 5.3b),",
            "# as tabulated in ERFA's nut00a.c (eraNut00a), 687 terms in ERFA's order.",
            "# Units: 0.1 microarcsecond.",
            "# dpsi += sp sin(arg) + cp cos(arg); deps += se sin(arg) + ce cos(arg)",
            "# arg = sum of the 13 multipliers times l F D Om Me Ve E Ma Ju Sa Ur Ne pA.",
        ],
    )
    lines.append("# nl nf nd nom nme nve nea nma nju nsa nur nne npa sp cp se ce")
    lines += [" ".join(row) for row in planetary]
    (DATA_DIR / "nutation_iau2000a_planetary.txt").write_text("\n".join(lines) + "\n")

    polynomial = NUMBER_RE.findall(table_block(s06, "static const double sp[]"))
    if len(polynomial) != 6:
        sys.exit(f"error: s06 sp: expected 6 coefficients, got {len(polynomial)}")
    counts = [33, 3, 25, 4, 1]
    lines = header(
        sdist_name,
        "s06.c",
        [
            "# IAU 2006/2000A series for s + XY/2 (IERS Conventions (2010) table 5.2d),",
            "# as tabulated in ERFA's s06.c (eraS06). Units: arcseconds.",
            "# POLY power coefficient: the polynomial part, t^0 .. t^5.",
            "# TERM power l l' F D Om LVe LE pA s c: t^power (s sin(arg) + c cos(arg)),",
            "# arg = sum of the 8 multipliers times the fundamental arguments.",
        ],
    )
    for power, coefficient in enumerate(polynomial):
        lines.append(f"POLY {power} {coefficient}")
    for power, count in enumerate(counts):
        block = table_block(s06, f"static const TERM s{power}[]")
        for row in s06_rows(block, f"s06 s{power}", count):
            lines.append(f"TERM {power} " + " ".join(row))
    (DATA_DIR / "cio_locator_iau2006_s06.txt").write_text("\n".join(lines) + "\n")

    write_xy06(xy06, sdist_name)

    notice = (
        "ERFA licence notice, copied verbatim from liberfa/erfa/LICENSE in "
        f"{sdist_name}.\nIt covers nutation_iau2000a_luni_solar.txt, "
        "nutation_iau2000a_planetary.txt,\ncio_locator_iau2006_s06.txt and "
        "cip_xy_iau2006_xy06.txt, extracted from ERFA's nut00a.c,\ns06.c and xy06.c.\n\n"
    )
    (DATA_DIR / "LICENSE-ERFA.txt").write_text(notice + licence)
    print(
        f"wrote {len(luni_solar)} luni-solar, {len(planetary)} planetary and "
        f"{sum(counts)} + 6 CIO-locator terms to {DATA_DIR}"
    )


if __name__ == "__main__":
    main()
