#!/usr/bin/env bash
# Copies the two published leap-second files used as test references and records where they
# came from (package versions) in leap_second_files_versions.txt.
#   Leap_Second.dat    : IERS format, as shipped in the PyPI package astropy-iers-data
#   leap-seconds.list  : IETF/tz format, as shipped in Debian's tzdata package
# Run from anywhere: bash tests/reference/copy_leap_second_files.sh
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"

iers_dir="$(python3 -c 'import astropy_iers_data, os; print(os.path.dirname(astropy_iers_data.__file__))')"
cp "$iers_dir/data/Leap_Second.dat" "$here/Leap_Second.dat"
cp /usr/share/zoneinfo/leap-seconds.list "$here/leap-seconds.list"

{
  echo "Leap_Second.dat: PyPI astropy-iers-data $(python3 -c 'import importlib.metadata as m; print(m.version("astropy-iers-data"))')"
  echo "leap-seconds.list: Debian tzdata $(dpkg-query -W -f='${Version}' tzdata)"
  echo "utc_tai_erfa.csv: PyPI pyerfa $(python3 -c 'import erfa; print(erfa.__version__)') (made by make_utc_tai_reference.py)"
  echo "Licences: leap-seconds.list states 'This file is in the public domain' (IERS EOC);"
  echo "  Leap_Second.dat is published by the IERS EOC (Paris Observatory), shipped in astropy-iers-data (BSD-3-Clause);"
  echo "  the CSVs are pyerfa outputs (ERFA: BSD-3-Clause, Copyright (C) 2013-2023 NumFOCUS Foundation, derived from IAU SOFA)."
} > "$here/leap_second_files_versions.txt"
cat "$here/leap_second_files_versions.txt"
