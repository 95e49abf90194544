#!/usr/bin/env bash
# Regenerates the EMF model code of bundles/limen.model (src-gen/, plugin.xml) from model/limen.genmodel with
# the headless generator in releng/limen.model.generator (Maven profile generate-model, outside the Tycho build).
#
#   releng/regenerate-model.sh          regenerate in place (src-gen/ is rebuilt from scratch)
#   releng/regenerate-model.sh check    regenerate into a scratch copy; exit 1 and show the difference when the
#                                       checked-in code is not exactly what the generator writes (CI uses this)
#
# src-gen/ holds generated code only: hand-written logic lives in src/, so rebuilding src-gen from scratch
# loses nothing, and the check also catches stale or hand-edited generated files.
# Extra Maven arguments can be passed in MVN_ARGS (for example MVN_ARGS=-o for offline).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
mode=${1:-generate}
case "$mode" in generate|check) ;; *) echo "usage: $0 [check]" >&2; exit 2 ;; esac
if [ -x "$top/mvnw" ]; then mvn=("$top/mvnw"); else mvn=(mvn); fi
bundle="$top/bundles/limen.model"
generated=(src-gen plugin.xml)

run_generator() { # $1: bundle folder to generate into
    "${mvn[@]}" -q ${MVN_ARGS:-} -f "$top/releng/limen.model.generator/pom.xml" -Pgenerate-model package \
        -Dlimen.model.dir="$1"
}

if [ "$mode" = generate ]; then
    rm -rf "$bundle/src-gen"
    run_generator "$bundle"
    exit 0
fi

scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT
mkdir -p "$scratch/limen.model"
(cd "$bundle" && cp -r model META-INF build.properties plugin.properties "$scratch/limen.model/")
cp "$bundle/plugin.xml" "$scratch/limen.model/" # the generator merges into an existing plugin.xml
run_generator "$scratch/limen.model" >"$scratch/generator.log" 2>&1 || { cat "$scratch/generator.log" >&2; exit 2; }
status=0
for f in "${generated[@]}" META-INF build.properties plugin.properties; do
    if ! diff -r -u "$bundle/$f" "$scratch/limen.model/$f" >"$scratch/diff.txt" 2>&1; then
        echo "regenerating the model changes $f:" >&2
        cat "$scratch/diff.txt" >&2
        status=1
    fi
done
[ $status -eq 0 ] && echo "regenerated model code is identical to the checked-in code" >&2
exit $status
