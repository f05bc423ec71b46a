#!/usr/bin/env bash
# Runs every benchmark of a Release build and compares the figures with tests/bench/budgets.txt.
#   packaging/bench.sh BUILD_DIR        (packaging/bootstrap bench builds the release preset and calls this)
# Environment: BENCH_REPETITIONS (default 5; the median of the repetitions is compared), BENCH_WORK_DIR (default a
# new temporary folder; the JSON of each program and the MEASURE lines are kept there), BENCH_FILTER (a Google
# Benchmark filter, for a quick look at one figure).
# Exit status 0 when every budget holds, 1 when one is missed or a program fails, 2 for a bad argument.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
top=$(cd "$here/.." && pwd)
build=${1:-}
repetitions=${BENCH_REPETITIONS:-5}
filter=${BENCH_FILTER:-.}

say() { printf 'bench: %s\n' "$*"; }

if [ -z "$build" ] || [ ! -d "$build/bin" ]; then
  say "usage: packaging/bench.sh BUILD_DIR (a Release build with -DBEAMWARDEN_BENCH=ON, e.g. build-release)"
  exit 2
fi
work=${BENCH_WORK_DIR:-$(mktemp -d "${TMPDIR:-/tmp}/beamwarden-bench-XXXXXX")}
mkdir -p "$work"
failed=0

shopt -s nullglob
programs=("$build"/bin/bench_*)
measures=("$build"/bin/measure_*)
if [ ${#programs[@]} -eq 0 ]; then
  say "no bench_* programs in $build/bin: configure with -DBEAMWARDEN_BENCH=ON (preset release)"
  exit 2
fi

for program in "${programs[@]}"; do
  name=$(basename "$program")
  say "$name ($repetitions repetitions)"
  if ! "$program" --benchmark_repetitions="$repetitions" --benchmark_filter="$filter" \
    --benchmark_out="$work/$name.json" --benchmark_out_format=json; then
    say "$name failed"
    failed=1
  fi
done
for program in "${measures[@]}"; do
  name=$(basename "$program")
  say "$name"
  mkdir -p "$work/$name"
  if ! "$program" "$build/bin" "$work/$name" | tee "$work/$name.measure"; then
    say "$name failed"
    failed=1
  fi
done

echo
python3 "$top/tests/bench/check_budgets.py" "$top/tests/bench/budgets.txt" "$work" || failed=1
say "figures kept in $work"
exit $failed
