#!/usr/bin/env bash
# Builds the benchmark jar (and the bundles it measures) and runs the benchmarks.
#   bench/run.sh                 all benchmarks, default JMH settings of each class
#   bench/run.sh Psi             only classes matching the regexp
# Output: JMH's table, then one line per benchmark with its ratio to the baseline of the same class.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/mvnw" -B -q -f "$top/pom.xml" -DskipTests -pl bench -am package 2>&1 | grep -v 'osgi.platform' | grep -E 'ERROR|FAIL' || true
exec java -jar "$top/bench/target/benchmarks.jar" "$@"
