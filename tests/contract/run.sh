#!/usr/bin/env bash
# Contract test: schemathesis (from PyPI) against the service's own /openapi.json, every
# operation, every check. Starts the server on a free loopback port and stops it afterwards.
#
#   bash tests/contract/run.sh                              # CI size (30 examples per operation)
#   CONTRACT_MAX_EXAMPLES=1000 bash tests/contract/run.sh   # the full run (over 5 000 requests)
#
# The settings in tests/contract/schemathesis.toml state which operations may answer 422 to
# schema-valid data (see tests/contract/README.md).
#
# Environment: CONTRACT_MAX_EXAMPLES (examples per operation and phase), CONTRACT_SEED,
# CONTRACT_BINARY (a built eigenzeit binary; default: build the debug one), CONTRACT_WORKERS.
set -euo pipefail
cd "$(dirname "$0")/../.."

max_examples="${CONTRACT_MAX_EXAMPLES:-30}"
seed="${CONTRACT_SEED:-20261202}"
workers="${CONTRACT_WORKERS:-2}"
report_dir="${CONTRACT_REPORT_DIR:-target/contract}"

if ! command -v schemathesis >/dev/null 2>&1; then
  python3 -m pip install --quiet --disable-pip-version-check 'schemathesis>=4,<5'
fi

binary="${CONTRACT_BINARY:-}"
if [ -z "$binary" ]; then
  cargo build --quiet --locked --bin eigenzeit
  binary="${CARGO_TARGET_DIR:-target}/debug/eigenzeit"
fi

port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1]); s.close()')
mkdir -p "$report_dir"
"$binary" --addr "127.0.0.1:$port" --log-level warn >"$report_dir/server.log" 2>&1 &
server_pid=$!
trap 'kill "$server_pid" 2>/dev/null || true; wait "$server_pid" 2>/dev/null || true' EXIT

for _ in $(seq 100); do
  if curl -fsS "http://127.0.0.1:$port/healthz" >/dev/null 2>&1; then break; fi
  sleep 0.1
done

set +e
schemathesis --config-file tests/contract/schemathesis.toml \
  run "http://127.0.0.1:$port/openapi.json" \
  --checks all \
  --max-examples "$max_examples" \
  --seed "$seed" \
  --workers "$workers" \
  --suppress-health-check too_slow,filter_too_much,data_too_large \
  --request-timeout 30 \
  --report junit --report-dir "$report_dir" \
  --no-color 2>&1 | tee "$report_dir/schemathesis.txt"
status=${PIPESTATUS[0]}
set -e
if ! kill -0 "$server_pid" 2>/dev/null; then
  echo "contract: the server died during the run (see $report_dir/server.log)"
  exit 1
fi
# What the server answered, per operation and status (from its own request counter).
curl -fsS "http://127.0.0.1:$port/metrics" \
  | sed -n 's/^eigenzeit_http_requests_total{route="\([^"]*\)",method="\([^"]*\)",status="\([^"]*\)"} \(.*\)$/\2 \1 \3 \4/p' \
  | sort >"$report_dir/answers-by-status.txt" || true
echo "== answers by operation and status (method, route, status, count): $report_dir/answers-by-status.txt"
cat "$report_dir/answers-by-status.txt"
exit "$status"
