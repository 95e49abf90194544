#!/usr/bin/env bash
# One run, same machine, same data: JMH FitBench (limen.fit) and then R's glm timed by glm_timing.R.
#   bench/r/fit_vs_glm.sh            (needs bench/target/benchmarks.jar: bench/run.sh builds it; and Rscript)
# Compare FitBench.twoParameterLogisticLikeGlm with the glm() and glm.fit() lines.
set -euo pipefail
top=$(cd "$(dirname "$0")/../.." && pwd)
java -jar "$top/bench/target/benchmarks.jar" 'limen\.bench\.FitBench' "$@"
if command -v Rscript >/dev/null; then
  Rscript "$top/bench/r/glm_timing.R"
else
  echo "Rscript not found: R glm timing skipped (apt-get install --no-install-recommends r-base-core)" >&2
fi
