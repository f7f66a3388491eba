#!/usr/bin/env bash
# Command-level benchmark of `trimwright check`: generates a spec of N trim fields (default 2000) with
# org.trimwright.model.spec.SyntheticSpecs and times the whole command (JVM start, load, analysis, validation,
# output) with a bounded heap. Usage: releng/check-benchmark.sh [FIELDS] [HEAP] [extra check options...]
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
SPEC="$(mktemp -d)/synthetic-$FIELDS.trimspec"
java -cp "$CP" org.trimwright.model.spec.SyntheticSpecs "$FIELDS" "$SPEC"
echo "cores: $(nproc), load: $(cut -d' ' -f1-3 /proc/loadavg), heap limit: $HEAP"
START=$(date +%s.%N)
set +e
/usr/bin/time -f "wall %e s, user %U s, system %S s, max RSS %M kB" \
    java -Xmx"$HEAP" -cp "$CP" org.trimwright.cli.Main check "$SPEC" "$@" | head -n 1
CODE=${PIPESTATUS[0]}
set -e
echo "check exit code: $CODE; wall (shell) $(echo "$(date +%s.%N) - $START" | bc) s"
rm -f "$SPEC"
