#!/usr/bin/env sh
# Posts the demo ephemerides to a running eigenzeit service and prints each object's summary.
set -eu
here=$(cd "$(dirname "$0")" && pwd)
base=${EIGENZEIT_URL:-http://127.0.0.1:8080}
url=$base/v1/clock/proper-time

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

echo "== CCSDS OEM (CENTER_NAME = MOON, ICRF, TDB): the Tern lunar orbiters against TCL"
curl -sS --fail-with-body -X POST -H 'Content-Type: application/ccsds-oem' \
    --data-binary "@$here/tern_lunar.oem" "$url?include_series=false" | summarize

echo "== SP3-d (Earth-fixed, GPS time): Lyra"
curl -sS --fail-with-body -X POST -H 'Content-Type: application/sp3' \
    --data-binary "@$here/lyra.sp3" "$url" | summarize

post() {
    curl -sS --fail-with-body -X POST -H 'Content-Type: application/json' \
        --data-binary "@$here/requests/$2" "$base$1"
}

echo "== Kestrel-1 pass times from UTC (Tessaro station as TDB observer)"
post /v1/time/convert convert_kestrel_passes.json | python3 -c '
import json, sys
for c in json.load(sys.stdin)["conversions"]:
    print(c["input"]["iso"], " ".join("%s=%s" % (r["scale"], r["iso"]) for r in c["results"]))
'

echo "== Clock rates against TT: a Lyra orbit, two stations, a lunar south-pole site"
post /v1/clock/rate rate_lyra_and_stations.json | python3 -c '
import json, sys
for r in json.load(sys.stdin)["results"]:
    u = r["us_per_day"]
    print("%12s  sr %+9.4f  gr %+9.4f  total %+9.4f us/day" % (r["subject"], u["sr"], u["gr"], u["total"]))
'

echo "== The invented Skua lunar surface clock: rate on the demo day, proper time over a month"
post /v1/clock/rate rate_skua_lunar_clock.json | python3 -c '
import json, sys
lunar = json.load(sys.stdin)["results"][0]["lunar"]
at, span = lunar["at_epoch"], lunar["over_span"]
for scale in ("tt", "tcg", "tcl", "tl"):
    a, s = at[scale], span[scale]
    print("%4s  %+10.5f us/day (month mean %+10.5f)  over the span %+.6e s, periodic %.3e s p-p" % (
        scale.upper(), a["us_per_day"], a["month_mean_us_per_day"], s["offset_s"], s["periodic_peak_to_peak_s"]))
print("simultaneity term over the span %+.3e s (kept apart)" % span["simultaneity_s"])
'

echo "== A Lyra clock against the Tessaro station clock"
post /v1/clock/compare compare_lyra_vs_tessaro.json | python3 -c '
import json, sys
d = json.load(sys.stdin)["a_minus_b"]
print("Lyra runs %+.4f us/day (%+.1f ns/day) against Tessaro" % (d["us_per_day"], d["ns_per_day"]))
'

echo "== Signal from LYR-01 to Tessaro"
post /v1/signal/path signal_lyra01_to_tessaro.json | python3 -c '
import json, sys
d = json.load(sys.stdin)
t = d["terms"]
print("light time %.9f s; Sagnac %+.3f m, Shapiro %+.4f m" % (d["light_time_s"], t["sagnac"]["m"], t["shapiro"]["m"]))
'

echo "== Two-way time transfer Tessaro - Harrow through a satellite at 5 E"
post /v1/signal/two-way two_way_tessaro_harrow.json | python3 -c '
import json, sys
d = json.load(sys.stdin)
print("legs %+.3e s / %+.3e s; two-way Sagnac correction %+.3e s" % (d["leg_a_s"], d["leg_b_s"], d["two_way_s"]))
'
