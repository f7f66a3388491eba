#!/usr/bin/env bash
# Command-level wall time of `./trimwright analyze` (issue 4 target: the 12-bit segmented field, 6 unary bits,
# with 1 000 000 Monte Carlo trials in under 2 s). Run from anywhere; it works in the repository root.
#   releng/org.trimwright.benchmarks/command-timings.sh [RUNS]      (default 10 runs, 1 warm-up run)
# Uses hyperfine when installed (Debian package hyperfine), else repeated /usr/bin/time (or bash's time).
# Results (the tool's own summary) go to stdout and, with hyperfine, to target/command-timings.{md,json}.
set -euo pipefail
HERE="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
ROOT="$(cd "$HERE/../.." && pwd)"
RUNS="${1:-10}"
OUT="$HERE/target"
mkdir -p "$OUT"
cd "$ROOT"

FIELD=(--bits 12 --coding segmented --unary-bits 6 --at-zero 0A --step 1uA)
MC=(--unit-sigma 1 --trials 1000000 --json)
BASE_CMD="./trimwright analyze ${FIELD[*]} --json"
MC_CMD="./trimwright analyze ${FIELD[*]} ${MC[*]}"

# Build the launcher's jars first so that no build lands inside a timed run.
./trimwright help >/dev/null

if ! ./trimwright analyze "${FIELD[@]}" "${MC[@]}" >/dev/null 2>"$OUT/command-probe.err"; then
    echo "command-timings: '$MC_CMD' fails here (does analyze have --unit-sigma and --trials yet?):" >&2
    cat "$OUT/command-probe.err" >&2
    exit 2
fi

echo "machine: $(nproc) cores, $(java -version 2>&1 | head -n 1), load average: $(cut -d' ' -f1-3 /proc/loadavg)"
if command -v hyperfine >/dev/null 2>&1; then
    hyperfine --warmup 1 --runs "$RUNS" --export-markdown "$OUT/command-timings.md" \
        --export-json "$OUT/command-timings.json" \
        -n "analyze (coding only)" "$BASE_CMD" \
        -n "analyze --trials 1000000" "$MC_CMD"
else
    for cmd in "$BASE_CMD" "$MC_CMD"; do
        echo "== $cmd"
        $cmd >/dev/null 2>&1
        for _ in $(seq "$RUNS"); do
            if [ -x /usr/bin/time ]; then
                /usr/bin/time -f "%e s wall, %U s user, %S s sys" $cmd >/dev/null
            else
                TIMEFORMAT="%R s wall, %U s user, %S s sys"
                time $cmd >/dev/null
            fi
        done
    done
fi
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
