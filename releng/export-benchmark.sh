#!/usr/bin/env bash
# Command-level benchmark of `trimwright export`: generates a spec of N trim fields (default 2000) with
# org.trimwright.model.spec.SyntheticSpecs and times the whole command as users run it, through the ./trimwright
# launcher and its JVM options (JVM start, load, analysis, validation, every format), with a bounded heap. Prints
# cores, load average, wall and CPU time, max RSS.
# Usage: releng/export-benchmark.sh [FIELDS] [HEAP] [extra export options, e.g. --trials 200 --formats html,pdf]
set -euo pipefail
HERE="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
FIELDS="${1:-2000}"
HEAP="${2:-256m}"
shift $(( $# > 2 ? 2 : $# )) || true
REPO="${MAVEN_REPO_LOCAL:-$HOME/.m2/repository}"
"$HERE/trimwright" help >/dev/null    # builds the jars on first use
CP=""
for b in org.trimwright.engine org.trimwright.model org.trimwright.analysis org.trimwright.cli org.trimwright.charts \
        org.trimwright.export; do
    CP="$CP:$HERE/bundles/$b/target/$b-0.1.0-SNAPSHOT.jar"
done
while IFS=: read -r g a v; do
    case "$g" in ''|'#'*) continue ;; esac
    CP="$CP:$REPO/${g//.//}/$a/$v/$a-$v.jar"
done < "$HERE/bundles/org.trimwright.cli/runtime.classpath"
CP="${CP#:}"
WORK="$(mktemp -d)"
SPEC="$WORK/synthetic-$FIELDS.trimspec"
java -cp "$CP" org.trimwright.model.spec.SyntheticSpecs "$FIELDS" "$SPEC"
echo "cores: $(nproc), load before: $(cut -d' ' -f1-3 /proc/loadavg), heap limit: $HEAP, options: $*"
set +e
/usr/bin/time -f "wall %e s, CPU user %U s + system %S s, max RSS %M kB" \
    env TRIMWRIGHT_JAVA_OPTS="-Xmx$HEAP ${BENCH_JAVA_OPTS:-}" "$HERE/trimwright" export "$SPEC" --out "$WORK/out" "$@" \
    2>&1 >/dev/null \
    | grep -E "^trimwright export: done|^wall|Exception|Error" 
CODE=${PIPESTATUS[0]}
set -e
echo "export exit code: $CODE; load after: $(cut -d' ' -f1-3 /proc/loadavg); output $(du -sh "$WORK/out" | cut -f1)"
ls -la "$WORK/out" | grep -E "spec\.(html|pdf)" | awk '{print $5, $9}'
rm -rf "$WORK"
