#!/usr/bin/env bash
# Client test: the OpenAPI document serves a code generator. Generates a Python client from
# openapi/openapi.json with openapi-python-client (from PyPI, pinned, in a venv), starts the
# release server on a free loopback port, and calls every operation of the document through the
# generated client only (tests/client/call_every_operation.py). Stops the server afterwards.
#
#   bash tests/client/run.sh
#
# The generator's warnings fail the run, except the one it gives for every document: it cannot
# write request bodies of text media types (KNOWN_WARNINGS below).
#
# Environment: CLIENT_BINARY (a built eigenzeit binary; default: build the release one),
# CLIENT_WORK_DIR (venv, generated client, server log; default target/client).
set -euo pipefail
cd "$(dirname "$0")/../.."

generator='openapi-python-client==0.29.1'
work_dir="${CLIENT_WORK_DIR:-target/client}"
venv="$work_dir/venv"

if [ ! -x "$venv/bin/openapi-python-client" ] \
  || ! "$venv/bin/python" -m pip show openapi-python-client 2>/dev/null | grep -qx "Version: ${generator#*==}"; then
  rm -rf "$venv"
  python3 -m venv "$venv"
  "$venv/bin/python" -m pip install --quiet --disable-pip-version-check "$generator"
fi

binary="${CLIENT_BINARY:-}"
if [ -z "$binary" ]; then
  cargo build --quiet --locked --release --bin eigenzeit
  binary="${CARGO_TARGET_DIR:-target}/release/eigenzeit"
fi

# (2) Generate the client; any warning not listed here is a finding about the document.
rm -rf "$work_dir/generated"
mkdir -p "$work_dir/generated"
"$venv/bin/openapi-python-client" generate --path openapi/openapi.json \
  --config tests/client/generator.yaml --meta none \
  --output-path "$work_dir/generated/eigenzeit_client" >"$work_dir/generator.txt" 2>&1 || {
  cat "$work_dir/generator.txt"
  echo "client: the generator failed on openapi/openapi.json"
  exit 1
}
"$venv/bin/python" tests/client/generator_warnings.py "$work_dir/generator.txt"

port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1]); s.close()')
"$binary" --addr "127.0.0.1:$port" --log-level warn >"$work_dir/server.log" 2>&1 &
server_pid=$!
trap 'kill "$server_pid" 2>/dev/null || true; wait "$server_pid" 2>/dev/null || true' EXIT

ready=no
for _ in $(seq 100); do
  if curl -fsS "http://127.0.0.1:$port/readyz" >/dev/null 2>&1; then ready=yes; break; fi
  sleep 0.1
done
if [ "$ready" != yes ]; then
  echo "client: the server was not ready after 10 s (see $work_dir/server.log)"
  exit 1
fi

# (3) Every operation, through the generated client only.
"$venv/bin/python" tests/client/call_every_operation.py \
  --document openapi/openapi.json \
  --client-dir "$work_dir/generated" \
  --base-url "http://127.0.0.1:$port"
