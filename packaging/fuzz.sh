#!/usr/bin/env bash
# Builds the libFuzzer targets of tests/fuzz with clang and runs each one from its seed corpus for a bounded time.
#   packaging/fuzz.sh [SECONDS]    SECONDS of fuzzing per target (default 60)
# Environment: FUZZ_CXX (default clang++-16), FUZZ_BUILD_DIR (default build-fuzz/), FUZZ_WORK_DIR (default a new
# temporary folder: the inputs each run finds and anything it breaks are kept there, never in the repository), JOBS.
# Debian packages: clang-16, libclang-rt-16-dev, llvm (llvm-symbolizer, for stacks with file and line).
# Exit status 0 when every target ran its time without a finding, 1 otherwise (each finding is named with the
# command that reproduces it), 2 for a bad argument.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
top=$(cd "$here/.." && pwd)
seconds=${1:-60}
build=${FUZZ_BUILD_DIR:-$top/build-fuzz}
cxx=${FUZZ_CXX:-clang++-16}
jobs=${JOBS:-$(nproc)}

say() { printf 'fuzz: %s\n' "$*"; }

case "$seconds" in
  '' | *[!0-9]* | 0)
    say "SECONDS must be a whole number above 0, not '$seconds'"
    exit 2
    ;;
esac
if ! command -v "$cxx" >/dev/null; then
  say "$cxx not found; install the Debian packages clang-16 and libclang-rt-16-dev"
  exit 1
fi
work=${FUZZ_WORK_DIR:-$(mktemp -d "${TMPDIR:-/tmp}/beamwarden-fuzz-XXXXXX")}
mkdir -p "$work"

say "configuring $build with $cxx"
CXX=$cxx cmake -S "$top" -B "$build" -G Ninja -DCMAKE_BUILD_TYPE=Debug -DBEAMWARDEN_FUZZ=ON \
  -DBEAMWARDEN_BUILD_GUI=OFF -DBEAMWARDEN_BUILD_TESTS=OFF >"$work/configure.log" 2>&1 ||
  { cat "$work/configure.log"; exit 1; }
say "building"
cmake --build "$build" --parallel "$jobs" >"$work/build.log" 2>&1 || { tail -n 40 "$work/build.log"; exit 1; }

# Stacks with file and line; a leak, an undefined operation or a broken promise stops a run like a crash.
if command -v llvm-symbolizer >/dev/null; then
  export ASAN_SYMBOLIZER_PATH=${ASAN_SYMBOLIZER_PATH:-$(command -v llvm-symbolizer)}
fi
export ASAN_OPTIONS=${ASAN_OPTIONS:-detect_leaks=1}
export UBSAN_OPTIONS=${UBSAN_OPTIONS:-print_stacktrace=1:halt_on_error=1}

failed=()
say "$seconds s per target; new inputs and findings go to $work"
for source in "$top"/tests/fuzz/fuzz_*.cpp; do
  target=$(basename "$source" .cpp)
  name=${target#fuzz_}
  seeds=$top/tests/fuzz/corpus/$name
  if [ ! -d "$seeds" ] || [ -z "$(ls -A "$seeds")" ]; then
    say "$target: no seed corpus in tests/fuzz/corpus/$name"
    failed+=("$target")
    continue
  fi
  scratch=$work/$name
  mkdir -p "$scratch/new" "$scratch/findings"
  log=$scratch/log.txt
  # The scratch folder comes first: libFuzzer adds what it finds to the first folder and only reads the seeds.
  status=0
  (cd "$scratch" && "$build/bin/$target" -max_total_time="$seconds" -timeout=20 -rss_limit_mb=2048 \
    -print_final_stats=1 -artifact_prefix="$scratch/findings/" "$scratch/new" "$seeds") >"$log" 2>&1 || status=$?
  # A target that stops on a seed prints no statistics: these stay empty ("?") rather than stop the script.
  runs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log" | tail -n 1)
  speed=$(sed -n 's/^stat::average_exec_per_sec: *//p' "$log" | tail -n 1)
  coverage=$(sed -n 's/.*cov: \([0-9]*\).*/\1/p' "$log" | tail -n 1)
  found=$(find "$scratch/new" -type f | wc -l)
  verdict=ok
  [ "$status" -eq 0 ] || verdict=FINDING
  say "$(printf '%-16s %-7s %10s runs %7s exec/s  coverage %5s  %4s new inputs' "$target" "$verdict" \
    "${runs:-?}" "${speed:-?}" "${coverage:-?}" "$found")"
  if [ "$status" -ne 0 ]; then
    failed+=("$target")
    grep -m 3 -E 'ERROR: |broken promise|runtime error|SUMMARY' "$log" | sed 's/^/    /' || true
    for finding in "$scratch"/findings/*; do
      if [ -e "$finding" ]; then
        say "    reproduce: $build/bin/$target $finding"
      fi
    done
    say "    log: $log"
  fi
done

if [ ${#failed[@]} -gt 0 ]; then
  say "findings in ${#failed[@]} target(s): ${failed[*]}"
  exit 1
fi
say "every target ran ${seconds} s without a finding"
