#!/usr/bin/env sh
# Posts the demo ephemerides to a running eigenzeit service and prints each object's summary.
set -eu
here=$(cd "$(dirname "$0")" && pwd)
url=${EIGENZEIT_URL:-http://127.0.0.1:8080}/v1/clock/proper-time

summarize() {
    python3 -c '
import json, sys
answer = json.load(sys.stdin)
objects = answer.get("objects", answer if isinstance(answer, list) else [])
if not objects:
    print(json.dumps(answer, indent=2))
for item in objects:
    s = item["summary"]
    print("%10s  %+10.4f us/day  accumulated %+.6e s  periodic %.3e s  residual rms %.3e s" % (
        item["id"], s["mean_rate_us_per_day"], s["accumulated_s"],
        s["periodic_amplitude_s"], s["kepler_residual_rms_s"]))
'
}

echo "== CCSDS OEM (GCRF, UTC): Lyra and Kestrel-1"
curl -sS --fail-with-body -X POST -H 'Content-Type: application/ccsds-oem' \
    --data-binary "@$here/lyra_kestrel.oem" "$url" | summarize

echo "== SP3-d (Earth-fixed, GPS time): Lyra"
curl -sS --fail-with-body -X POST -H 'Content-Type: application/sp3' \
    --data-binary "@$here/lyra.sp3" "$url" | summarize
