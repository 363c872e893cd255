#!/usr/bin/env python3
"""Builds src/physics/earth/data/eop_snapshot.txt, the Earth orientation snapshot built into
eigenzeit, from the IERS files shipped in the PyPI package astropy-iers-data.

    pip install astropy-iers-data==0.2026.11.2.0.34.55
    python3 tools/make_eop_snapshot.py > src/physics/earth/data/eop_snapshot.txt

Splice (deterministic; no randomness, so no seed is needed):
- every day of the IERS EOP 20 C04 series (`eopc04.1962-now`) is taken as it is (observed);
- the days after the last C04 day come from IERS Bulletin A (`finals2000A.all`, the Bulletin A
  columns, not Bulletin B), with its I/P flags and, on predicted days, its error columns.

Integer units, exactly the files' printed resolution: polar motion and dX, dY in microarcseconds
(1e-6 arcsec), UT1-UTC and LOD in 1e-7 s. Each column is written as its first value, then its
first difference, then second differences (order 2), wrapped at about 100 characters; the Rust
reader (src/physics/earth/eop/snapshot.rs) sums them back.
"""
import os
import sys

import astropy_iers_data

DATA = os.path.join(os.path.dirname(astropy_iers_data.__file__), "data")
VERSION = astropy_iers_data.__version__


def units(text, scale):
    """Decimal text -> integer count of 10**-scale units, exactly (no float)."""
    text = text.strip()
    neg = text.startswith("-")
    text = text.lstrip("+-")
    whole, _, frac = text.partition(".")
    frac = (frac + "0" * scale)[:scale]
    value = int(whole or "0") * 10**scale + int(frac or "0")
    return -value if neg else value


def read_c04():
    rows = {}
    for line in open(os.path.join(DATA, "eopc04.1962-now")):
        if line.startswith("#") or not line.strip():
            continue
        f = line.split()
        mjd = int(float(f[4]))
        rows[mjd] = dict(
            status="O", nut="O",
            xp=units(f[5], 6), yp=units(f[6], 6), ut1=units(f[7], 7),
            dx=units(f[8], 6), dy=units(f[9], 6), lod=units(f[12], 7),
        )
    return rows


def read_finals():
    rows = {}
    for line in open(os.path.join(DATA, "finals2000A.all")):
        line = line.rstrip("\n").ljust(187)
        if not line[58:68].strip() or not line[18:27].strip():
            continue
        mjd = int(float(line[7:15]))
        pm_flag, ut_flag, nut_flag = line[16], line[57], line[95]
        row = dict(
            status="P" if "P" in (pm_flag, ut_flag) else "O",
            nut="P" if nut_flag == "P" else "O",
            xp=units(line[18:27], 6), yp=units(line[37:46], 6), ut1=units(line[58:68], 7),
            dx=units(line[97:106], 3) if line[97:106].strip() else None,
            dy=units(line[116:125], 3) if line[116:125].strip() else None,
            lod=units(line[79:86], 4) if line[79:86].strip() else None,
            sxp=units(line[27:36], 6), syp=units(line[46:55], 6), sut1=units(line[68:78], 7),
        )
        rows[mjd] = row
    return rows


def column(name, first_mjd, values):
    out = [f"column {name} {first_mjd} {len(values)}"]
    terms = []
    prev = prev_d = None
    for i, v in enumerate(values):
        if i == 0:
            terms.append(v)
        elif i == 1:
            prev_d = v - prev
            terms.append(prev_d)
        else:
            d = v - prev
            terms.append(d - prev_d)
            prev_d = d
        prev = v
    line = ""
    for t in terms:
        s = str(t)
        if len(line) + len(s) + 1 > 100:
            out.append(line)
            line = s
        else:
            line = f"{line} {s}" if line else s
    if line:
        out.append(line)
    return out


def runs(name, first_mjd, flags):
    out, start, cur = [], 0, flags[0]
    for i, f in enumerate(flags + [None]):
        if f != cur:
            out.append(f"{cur} {i - start}")
            start, cur = i, f
    return [f"runs {name} {first_mjd} " + " ".join(out)]


def main():
    c04, fin = read_c04(), read_finals()
    c04_last = max(c04)
    days = dict(c04)
    for mjd in sorted(fin):
        if mjd > c04_last:
            days[mjd] = fin[mjd]
    mjds = sorted(days)
    first, last = mjds[0], mjds[-1]
    assert mjds == list(range(first, last + 1)), "not daily"
    rows = [days[m] for m in mjds]
    last_obs = max(m for m in mjds if days[m]["status"] == "O")
    lines = [
        "# eigenzeit built-in Earth orientation parameters (made by tools/make_eop_snapshot.py)",
        f"# Source: astropy-iers-data {VERSION} (PyPI): IERS EOP 20 C04 eopc04.1962-now for MJD "
        f"{first}..{c04_last}, IERS Bulletin A finals2000A.all (Bulletin A columns) for MJD "
        f"{c04_last + 1}..{last}.",
        "# Terms: IERS products are free to use; cite the International Earth Rotation and",
        "# Reference Systems Service (IERS), Paris Observatory (C04) and USNO (Bulletin A).",
        "# Units: xp, yp, dx, dy in 1e-6 arcsec; ut1_utc, lod in 1e-7 s. Columns: first value,",
        "# first difference, then second differences. runs: status (O observed, P predicted).",
        "eop-snapshot 1",
        f"source IERS EOP 20 C04 + IERS Bulletin A finals2000A.all (astropy-iers-data {VERSION})",
        f"c04_last_mjd {c04_last}",
        f"last_observed_mjd {last_obs}",
    ]
    lines += runs("status", first, [r["status"] for r in rows])
    nut = [r["nut"] for r in rows if r["dx"] is not None]
    lines += runs("nutation_status", first, nut)
    for name, key in [("xp", "xp"), ("yp", "yp"), ("ut1_utc", "ut1")]:
        lines += column(name, first, [r[key] for r in rows])
    for name, key in [("dx", "dx"), ("dy", "dy"), ("lod", "lod")]:
        vals = []
        for r in rows:
            if r[key] is None:
                break
            vals.append(r[key])
        lines += column(name, first, vals)
    pred = [m for m in mjds if days[m]["status"] == "P"]
    for name, key in [("sigma_xp", "sxp"), ("sigma_yp", "syp"), ("sigma_ut1_utc", "sut1")]:
        lines += column(name, pred[0], [days[m][key] for m in pred])
    lines.append("end")
    sys.stdout.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
