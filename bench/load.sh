#!/usr/bin/env bash
# HTTP load test of the release server on the loopback interface.
#
# Builds and starts `eigenzeit` on a free 127.0.0.1 port (pinned to CPU 0 when taskset exists),
# drives each endpoint for DURATION seconds with wrk (pinned to CPU 1, 1 thread, CONNECTIONS
# connections), and prints requests/s, p50/p99 latency, non-2xx and socket errors, the ratio
# to the /healthz baseline measured in the same run, and the server's resident memory
# (VmRSS) before and after. Bounded in time; the server is stopped on exit.
#
# Usage: bench/load.sh [DURATION_S] [CONNECTIONS]      (defaults: 10 s, 2 connections)
# Environment: CARGO_TARGET_DIR (where the release binary is built), SKIP_BUILD=1.
set -euo pipefail

duration_s="${1:-10}"
connections="${2:-2}"
root="$(cd "$(dirname "$0")/.." && pwd)"
target_dir="${CARGO_TARGET_DIR:-$root/target}"
binary="$target_dir/release/eigenzeit"
work="$(mktemp -d)"

if ! command -v wrk >/dev/null 2>&1; then
    echo "installing wrk (Debian package)" >&2
    apt-get update -qq && apt-get install -y -qq wrk >/dev/null
fi

if [ "${SKIP_BUILD:-0}" != 1 ] || [ ! -x "$binary" ]; then
    (cd "$root" && cargo build --release --quiet --bin eigenzeit)
fi

pin() { # pin CPU COMMAND... : run on one CPU when taskset exists and there are 2+ CPUs
    local cpu="$1"
    shift
    if command -v taskset >/dev/null 2>&1 && [ "$(nproc)" -ge 2 ]; then
        taskset -c "$cpu" "$@"
    else
        "$@"
    fi
}

# shellcheck source=bench/common.sh
. "$root/bench/common.sh"
port="$(free_port)"
base="http://127.0.0.1:$port"
# Started directly (not through a shell function, which would fork a subshell) so that $! is
# the server itself: taskset replaces itself with the program.
server=("$binary" --addr "127.0.0.1:$port" --log-level warn)
if command -v taskset >/dev/null 2>&1 && [ "$(nproc)" -ge 2 ]; then
    server=(taskset -c 0 "${server[@]}")
fi
started_ns="$(date +%s%N)"
"${server[@]}" >"$work/server.log" 2>&1 &
server_pid=$!
trap cleanup EXIT INT TERM
wait_ready "$base" || true
ready_ms="$(( ($(date +%s%N) - started_ns) / 1000000 ))"
[ "$(readlink "/proc/$server_pid/exe")" = "$(readlink -f "$binary")" ] || {
    echo "process $server_pid is not the server" >&2
    exit 1
}
curl -fsS -o /dev/null "$base/healthz" || {
    echo "server did not start:" >&2
    cat "$work/server.log" >&2
    exit 1
}

rss_kib() { awk '/^VmRSS:/ {print $2}' "/proc/$server_pid/status"; }

rate_body='{"items":[{"orbit":{"semi_major_axis_m":26561750,"eccentricity":0.01}}]}'
cat >"$work/post_rate.lua" <<EOF
wrk.method = "POST"
wrk.body = '$rate_body'
wrk.headers["Content-Type"] = "application/json"
EOF

# A batch of 1000 UTC epochs to TDB (epochs/s = requests/s x 1000).
python3 - "$work/post_batch.lua" "$work/batch_100000.json" <<'PY'
import json, sys
def batch(n):
    return json.dumps({"from": "UTC", "to": ["TDB"], "format": "mjd",
                       "epochs": ["%.6f" % (61000 + k * 0.001) for k in range(n)]})
with open(sys.argv[1], "w") as f:
    body = batch(1000).replace("\\", "\\\\").replace("'", "\\'")
    f.write("wrk.method = \"POST\"\nwrk.body = '%s'\nwrk.headers[\"Content-Type\"] = \"application/json\"\n" % body)
with open(sys.argv[2], "w") as f:
    f.write(batch(100000))
PY

at="2026-03-14T06:30:00.123456789012"
# name | method | path | wrk script
endpoints=(
    "GET /healthz (baseline)|GET|/healthz|"
    "GET /v1/time/convert UTC->TDB|GET|/v1/time/convert?at=$at&from=UTC&to=TDB|"
    "GET /v1/time/convert to=all|GET|/v1/time/convert?at=$at&from=UTC&to=all|"
    "POST /v1/clock/rate (1 orbit)|POST|/v1/clock/rate|$work/post_rate.lua"
    "POST /v1/time/convert 1000 epochs|POST|/v1/time/convert|$work/post_batch.lua"
    "GET /v1/time/scales|GET|/v1/time/scales|"
)

# Converts wrk's latency text (e.g. 85.00us, 1.20ms, 2.00s) to microseconds.
to_us() {
    awk -v v="$1" 'BEGIN {
        n = v + 0; u = v; sub(/^[0-9.]+/, "", u);
        if (u == "us") f = 1; else if (u == "ms") f = 1000; else if (u == "s") f = 1e6; else f = 1;
        printf "%.1f", n * f }'
}

# Warm-up: one second per endpoint, so that "before" is the steady state (allocator arenas,
# connection buffers, the lazily built TDB fit) and "after" shows growth, not first use.
rss_cold="$(rss_kib)"
for entry in "${endpoints[@]}"; do
    IFS='|' read -r name method path script <<<"$entry"
    args=(-t1 "-c$connections" -d1s --timeout 5s)
    [ -n "$script" ] && args+=(-s "$script")
    pin 1 wrk "${args[@]}" "$base$path" >/dev/null 2>&1 || true
done
rss_before="$(rss_kib)"

printf '%-34s %10s %9s %9s %8s %7s %8s\n' endpoint "req/s" "p50 us" "p99 us" non-2xx errors "x base"
baseline_rps=""
for entry in "${endpoints[@]}"; do
    IFS='|' read -r name method path script <<<"$entry"
    if [ "$path" = /v1/time/convert ] && [ "$method" = POST ]; then
        status="$(curl -s -o /dev/null -w '%{http_code}' -X POST -H 'Content-Type: application/json' \
            --data '{"from":"UTC","to":["TDB"],"epochs":["2026-01-01"]}' "$base$path")"
    elif [ "$method" = POST ]; then
        status="$(curl -s -o /dev/null -w '%{http_code}' -X POST -H 'Content-Type: application/json' \
            --data "$rate_body" "$base$path")"
    else
        status="$(curl -s -o /dev/null -w '%{http_code}' "$base$path")"
    fi
    if [ "$status" = 404 ]; then
        printf '%-34s skipped: the endpoint answers 404 (not in this build)\n' "$name"
        continue
    fi
    args=(-t1 "-c$connections" "-d${duration_s}s" --latency --timeout 5s)
    [ -n "$script" ] && args+=(-s "$script")
    pin 1 wrk "${args[@]}" "$base$path" >"$work/wrk.txt" 2>&1
    rps="$(awk '/^Requests\/sec:/ {print $2}' "$work/wrk.txt")"
    p50="$(to_us "$(awk '$1 == "50%" {print $2}' "$work/wrk.txt")")"
    p99="$(to_us "$(awk '$1 == "99%" {print $2}' "$work/wrk.txt")")"
    non2xx="$(awk -F': ' '/Non-2xx or 3xx responses/ {print $2}' "$work/wrk.txt")"
    errors="$(awk '/Socket errors/ {gsub(",", ""); print $4 + $6 + $8 + $10}' "$work/wrk.txt")"
    [ -z "$baseline_rps" ] && baseline_rps="$rps"
    ratio="$(awk -v a="$rps" -v b="$baseline_rps" 'BEGIN { printf "%.2f", a / b }')"
    printf '%-34s %10.0f %9s %9s %8s %7s %8s   (first answer: HTTP %s)\n' "$name" "$rps" "$p50" "$p99" \
        "${non2xx:-0}" "${errors:-0}" "$ratio" "$status"
done

rss_after="$(rss_kib)"
echo "server VmRSS: at start ${rss_cold} KiB, after warm-up ${rss_before} KiB, after the run ${rss_after} KiB ($(awk -v a="$rss_after" -v b="$rss_before" 'BEGIN { printf "%+.1f", 100 * (a - b) / b }') % against warm-up)"
batch_status="$(curl -s -o /dev/null -w '%{http_code} in %{time_total} s' -X POST -H 'Content-Type: application/json' \
    --data-binary "@$work/batch_100000.json" "$base/v1/time/convert")"
hwm="$(awk '/^VmHWM:/ {print $2}' "/proc/$server_pid/status")"
echo "one maximum-size batch (100 000 epochs to TDB): HTTP $batch_status; peak VmHWM ${hwm} KiB"
echo "start to /readyz 200: ${ready_ms} ms"
echo "machine: $(nproc) CPUs; server on CPU 0, wrk on CPU 1; ${duration_s} s per endpoint, ${connections} connections"
