#!/usr/bin/env bash
# Speed of the time answers against the HTTP floor, and of a large batch against ERFA.
#
# Builds the release server, starts it pinned to CPU 0 (`taskset -c 0`), and drives each
# endpoint with wrk pinned to CPU 1 (1 thread, CONNECTIONS connections, DURATION seconds each,
# after a 2 s warm-up of every endpoint), all in the same run. Prints each endpoint's req/s
# and its ratio against `GET /healthz` measured in that run.
#
# Then one 100 000-epoch UTC -> TDB batch (`POST /v1/time/convert`, epochs as MJD text) over
# HTTP, best of REPEATS: as JSON with every form, and as CSV with one form (`forms=j2000_s`,
# `Accept: text/csv`; skipped when the server does not answer CSV), against vectorised ERFA
# in-process (pyerfa utctai -> taitt -> dtdb -> tttdb on the same 100 000 epochs, arrays
# already in memory), with the answer's size. Memory from /proc/<pid>/status: VmRSS at start
# and after the warm-up (idle), VmHWM after the CSV batch and after the JSON batch.
#
# A benchmark, not a test: it prints figures and asserts nothing.
# Usage: bench/http_ratios.sh [DURATION_S] [CONNECTIONS] [REPEATS]   (defaults: 10 s, 16, 3)
# Environment: CARGO_TARGET_DIR (where the release binary is built), SKIP_BUILD=1.
set -euo pipefail

duration_s="${1:-10}"
connections="${2:-16}"
repeats="${3:-3}"
root="$(cd "$(dirname "$0")/.." && pwd)"
target_dir="${CARGO_TARGET_DIR:-$root/target}"
binary="$target_dir/release/eigenzeit"
work="$(mktemp -d)"

for tool in wrk taskset curl python3; do
    command -v "$tool" >/dev/null 2>&1 || {
        echo "needs $tool (Debian: apt-get install -y wrk util-linux curl python3)" >&2
        exit 1
    }
done
[ "$(nproc)" -ge 2 ] || { echo "needs 2 CPUs (server on CPU 0, wrk on CPU 1)" >&2; exit 1; }

if [ "${SKIP_BUILD:-0}" != 1 ] || [ ! -x "$binary" ]; then
    (cd "$root" && cargo build --release --quiet --bin eigenzeit)
fi

# shellcheck source=bench/common.sh
. "$root/bench/common.sh"
port="$(free_port)"
base="http://127.0.0.1:$port"
# taskset replaces itself with the program, so $! is the server itself.
taskset -c 0 "$binary" --addr "127.0.0.1:$port" --log-level warn >"$work/server.log" 2>&1 &
server_pid=$!
trap cleanup EXIT INT TERM
wait_ready "$base" || true
curl -fsS -o /dev/null "$base/healthz" || {
    echo "server did not start:" >&2
    cat "$work/server.log" >&2
    exit 1
}
status_kib() { awk -v key="$1:" '$1 == key {print $2}' "/proc/$server_pid/status"; }
rss_start="$(status_kib VmRSS)"

cat >"$work/post_rate.lua" <<'EOF'
wrk.method = "POST"
wrk.body = '{"items":[{"orbit":{"semi_major_axis_m":26561750,"eccentricity":0.01}}]}'
wrk.headers["Content-Type"] = "application/json"
EOF

at="2026-03-14T06:30:00.123456789012"
# name | path | wrk script
endpoints=(
    "GET /healthz (baseline)|/healthz|"
    "GET /v1/time/convert to=TDB,TCB,GPST|/v1/time/convert?at=$at&from=UTC&to=TDB,TCB,GPST|"
    "GET /v1/time/convert to=TAI|/v1/time/convert?at=$at&from=UTC&to=TAI|"
    "GET /v1/time/now|/v1/time/now|"
    "POST /v1/clock/rate (1 orbit)|/v1/clock/rate|$work/post_rate.lua"
)

for entry in "${endpoints[@]}"; do
    IFS='|' read -r name path script <<<"$entry"
    args=(-t1 "-c$connections" -d2s --timeout 5s)
    [ -n "$script" ] && args+=(-s "$script")
    taskset -c 1 wrk "${args[@]}" "$base$path" >/dev/null 2>&1 || true
done
rss_idle="$(status_kib VmRSS)"

echo "== requests/s, server on CPU 0, wrk on CPU 1 (1 thread, $connections connections, $duration_s s each)"
printf '%-40s %10s %8s %8s %8s\n' endpoint "req/s" "p50 us" non-2xx "x healthz"
baseline_rps=""
for entry in "${endpoints[@]}"; do
    IFS='|' read -r name path script <<<"$entry"
    args=(-t1 "-c$connections" "-d${duration_s}s" --latency --timeout 5s)
    [ -n "$script" ] && args+=(-s "$script")
    taskset -c 1 wrk "${args[@]}" "$base$path" >"$work/wrk.txt" 2>&1
    rps="$(awk '/^Requests\/sec:/ {print $2}' "$work/wrk.txt")"
    p50="$(awk '$1 == "50%" {print $2}' "$work/wrk.txt")"
    non2xx="$(awk -F': ' '/Non-2xx or 3xx responses/ {print $2}' "$work/wrk.txt")"
    [ -z "$baseline_rps" ] && baseline_rps="$rps"
    ratio="$(awk -v a="$rps" -v b="$baseline_rps" 'BEGIN { printf "%.2f", a / b }')"
    printf '%-40s %10.0f %8s %8s %8s\n' "$name" "$rps" "$p50" "${non2xx:-0}" "$ratio"
done

echo "== 100 000-epoch UTC -> TDB batch (epochs as MJD text), best of $repeats"
python3 - "$work" <<'PY'
import json, sys
work = sys.argv[1]
epochs = ["%.6f" % (61000 + k * 0.001) for k in range(100_000)]
with open(work + "/batch.json", "w") as f:
    json.dump({"from": "UTC", "to": ["TDB"], "format": "mjd", "epochs": epochs}, f)
with open(work + "/batch_forms.json", "w") as f:
    json.dump({"from": "UTC", "to": ["TDB"], "format": "mjd", "forms": ["j2000_s"],
               "epochs": epochs}, f)
PY

best_post() { # best_post ACCEPT BODY_FILE QUERY -> "seconds bytes http_code content_type"
    local best="" line
    for _ in $(seq 1 "$repeats"); do
        line="$(curl -s -o "$work/answer" -w '%{time_total} %{size_download} %{http_code} %{content_type}' \
            -X POST -H 'Content-Type: application/json' -H "Accept: $1" \
            --data-binary "@$2" "$base/v1/time/convert$3")"
        if [ -z "$best" ] || awk -v a="${line%% *}" -v b="${best%% *}" 'BEGIN { exit !(a < b) }'; then
            best="$line"
        fi
    done
    echo "$best"
}

hwm_before="$(status_kib VmHWM)"
csv="$(best_post text/csv "$work/batch_forms.json" "")"
hwm_csv="$(status_kib VmHWM)"
json="$(best_post application/json "$work/batch.json" "")"
hwm_json="$(status_kib VmHWM)"

erfa_s="$(python3 - <<'PY' 2>/dev/null || echo unavailable
import time, warnings
import numpy as np, erfa
warnings.simplefilter("ignore", erfa.ErfaWarning)
mjd = 61000 + np.arange(100_000) * 0.001          # the same epochs as the HTTP batch
utc1 = np.full(mjd.shape, 2400000.5)
utc2 = mjd
best = None
for _ in range(5):
    start = time.perf_counter()
    tai1, tai2 = erfa.utctai(utc1, utc2)
    tt1, tt2 = erfa.taitt(tai1, tai2)
    dtr = erfa.dtdb(tt1, tt2, 0.0, 0.0, 0.0, 0.0)
    erfa.tttdb(tt1, tt2, dtr)
    elapsed = time.perf_counter() - start
    best = elapsed if best is None else min(best, elapsed)
print("%.4f" % best)
PY
)"
report() { # report NAME "seconds bytes code type"
    read -r seconds bytes code type <<<"$2"
    if [ "$code" != 200 ]; then
        printf '%-34s HTTP %s: not available in this build\n' "$1" "$code"
        return
    fi
    local against=""
    if [ "$erfa_s" != unavailable ]; then
        against="$(awk -v e="$erfa_s" -v s="$seconds" 'BEGIN { printf "%.1fx faster than ERFA", e / s }')"
    fi
    printf '%-34s HTTP %s %-26s %8.3f s %9.1f MB   %s\n' "$1" "$code" "$type" "$seconds" \
        "$(awk -v b="$bytes" 'BEGIN { print b / 1e6 }')" "$against"
}
report "JSON, every form" "$json"
report "CSV, forms=j2000_s" "$csv"
echo "vectorised ERFA in-process (pyerfa utctai/taitt/dtdb/tttdb, best of 5): $erfa_s s"

echo "== memory (server process, /proc/$server_pid/status)"
echo "VmRSS at start ${rss_start} KiB; idle after warm-up ${rss_idle} KiB"
echo "VmHWM before the batches ${hwm_before} KiB; after the CSV batch ${hwm_csv} KiB; after the JSON batch ${hwm_json} KiB"
echo "== machine: $(nproc) CPUs; reproduce: bench/http_ratios.sh $duration_s $connections $repeats"
