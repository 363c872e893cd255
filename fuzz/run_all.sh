#!/usr/bin/env bash
# Runs every fuzz target for SECONDS each (default 200), one after another (one core each),
# and prints the executions and findings of each. Needs cargo-fuzz (`cargo install cargo-fuzz`)
# and uses the stable toolchain's nightly features through RUSTC_BOOTSTRAP=1.
# Usage: fuzz/run_all.sh [SECONDS] [TARGET...]
set -euo pipefail
cd "$(dirname "$0")"
seconds="${1:-200}"
shift || true
targets=("$@")
if [ "${#targets[@]}" -eq 0 ]; then
    mapfile -t targets < <(ls fuzz_targets | sed 's/\.rs$//')
fi
export RUSTC_BOOTSTRAP=1
export CARGO_TARGET_DIR="${CARGO_TARGET_DIR:-$PWD/target}"
mkdir -p logs
for target in "${targets[@]}"; do
    mkdir -p "corpus/$target" "starting_inputs/$target"
    dict=()
    case "$target" in
        instant_text) dict=(-dict=instant.dict) ;;
        leap_second_file) dict=(-dict=leap_second_file.dict) ;;
    esac
    status=0
    cargo fuzz run -O "$target" "corpus/$target" "starting_inputs/$target" -- \
        -max_total_time="$seconds" -max_len=8192 -timeout=10 "${dict[@]}" \
        > "logs/$target.log" 2>&1 || status=$?
    runs=$(grep -Eo 'Done [0-9]+ runs in [0-9]+ second' "logs/$target.log" | tail -1 || true)
    echo "$target: exit $status; ${runs:-no summary}; corpus $(ls "corpus/$target" | wc -l) inputs; artifacts: $(ls "artifacts/$target" 2>/dev/null | wc -l)"
done
