#!/usr/bin/env bash
# Batch refit harness (limen.bench.RefitBatchBench): generates a stored archive once (1,000 sessions x 3
# tracks x 60 trials by default, in /dev/shm), then times reading+verifying all journals (baseline) and the
# batch refit with 500 bootstrap samples per track, in the same run.
#   bench/refit.sh                          defaults: --sessions 1000 --threads 2 --bootstrap 500
#   bench/refit.sh --sessions 100 --sequential
# JVM options through JAVA_OPTS, e.g. JAVA_OPTS=-Xmx128m to show that the heap does not grow with the archive;
# by default those ./limen refit takes for a large archive (-XX:+UseParallelGC, the optimising compiler).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/mvnw" -B -q -f "$top/pom.xml" -Dmaven.test.skip=true -pl bench -am package 2>&1 | grep -v 'osgi.platform' | grep -E 'ERROR|FAIL' || true
exec java ${JAVA_OPTS:--XX:+UseParallelGC} -cp "$top/bench/target/benchmarks.jar" limen.bench.RefitBatchBench --root "$top" "$@"
