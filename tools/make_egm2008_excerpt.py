#!/usr/bin/env python3
"""Builds src/physics/earth/data/egm2008_degree120.gfc, the EGM2008 coefficients built into
eigenzeit, from the ICGEM-format file EGM2008_120.gfc shipped in the `brahe` crate 1.8.1
(crates.io, MIT licence; the file is EGM2008 truncated at degree and order 120).

    cargo fetch --manifest-path <a scratch crate depending on brahe = "=1.8.1">
    python3 tools/make_egm2008_excerpt.py \
        ~/.cargo/registry/src/*/brahe-1.8.1/data/gravity_models/EGM2008_120.gfc \
        > src/physics/earth/data/egm2008_degree120.gfc

Deterministic (no randomness, so no seed): the header keys the reader needs are kept, the
coefficient lines keep degree, order, C and S as printed (the sigma columns are dropped), and
the input's SHA-256 is checked so that another file is not taken for this one.
"""
import hashlib
import sys

EXPECTED_SHA256 = "d733d2c4c19b968e2325c755924e448c91077024679e7a1f72c80ebcb0480b36"
KEYS = ("modelname", "earth_gravity_constant", "radius", "max_degree", "norm", "tide_system")


def main(path):
    raw = open(path, "rb").read()
    digest = hashlib.sha256(raw).hexdigest()
    if digest != EXPECTED_SHA256:
        sys.exit(f"{path}: SHA-256 {digest}, expected {EXPECTED_SHA256}")
    out = [
        "comment EGM2008 (Pavlis, Holmes, Kenyon & Factor 2012, J. Geophys. Res. 117, B04406),",
        "comment U.S. National Geospatial-Intelligence Agency; degree and order 120, from",
        "comment EGM2008_120.gfc of the brahe crate 1.8.1 by tools/make_egm2008_excerpt.py",
    ]
    in_header = True
    for line in raw.decode("ascii").splitlines():
        fields = line.split()
        if in_header:
            if fields and fields[0] in KEYS:
                out.append(f"{fields[0]} {fields[1]}")
            if line.startswith("end_of_head"):
                out.append("end_of_head")
                in_header = False
            continue
        if fields and fields[0] == "gfc":
            out.append(" ".join(fields[1:5]))
    sys.stdout.write("\n".join(out) + "\n")


if __name__ == "__main__":
    main(sys.argv[1])
