#!/usr/bin/env bash
# Regenerates the EMF code of bundles/limen.model (src-gen/, plugin.xml) and the EMF.Edit item providers of
# bundles/limen.model.edit (src-gen/, icons/, plugin.xml, plugin.properties) from limen.model's model/limen.genmodel
# with the headless generator in releng/limen.model.generator (Maven profile generate-model, outside Tycho).
#
#   releng/regenerate-model.sh          regenerate in place (the src-gen/ folders are rebuilt from scratch)
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
bundles="$top/bundles"
# what the generator writes (or would write if missing), per bundle
model_files=(src-gen plugin.xml META-INF build.properties plugin.properties)
edit_files=(src-gen icons plugin.xml plugin.properties META-INF build.properties)

run_generator() { # $1: folder holding limen.model and limen.model.edit to generate into
    "${mvn[@]}" -q ${MVN_ARGS:-} -f "$top/releng/limen.model.generator/pom.xml" -Pgenerate-model package \
        -Dlimen.model.dir="$1/limen.model" -Dlimen.generator.args=--edit
}

if [ "$mode" = generate ]; then
    rm -rf "$bundles/limen.model/src-gen" "$bundles/limen.model.edit/src-gen"
    run_generator "$bundles"
    exit 0
fi

scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT
mkdir -p "$scratch/limen.model" "$scratch/limen.model.edit"
# the hand-kept files the generator reads or merges into; the generated folders start empty
(cd "$bundles/limen.model" && cp -r model META-INF build.properties plugin.properties plugin.xml "$scratch/limen.model/")
(cd "$bundles/limen.model.edit" && cp -r META-INF build.properties plugin.properties plugin.xml "$scratch/limen.model.edit/")
run_generator "$scratch" >"$scratch/generator.log" 2>&1 || { cat "$scratch/generator.log" >&2; exit 2; }
status=0
compare() { # $1: bundle name, rest: paths
    local name=$1; shift
    for f in "$@"; do
        if ! diff -r -u "$bundles/$name/$f" "$scratch/$name/$f" >"$scratch/diff.txt" 2>&1; then
            echo "regenerating changes $name/$f:" >&2
            cat "$scratch/diff.txt" >&2
            status=1
        fi
    done
}
compare limen.model "${model_files[@]}"
compare limen.model.edit "${edit_files[@]}"
[ $status -eq 0 ] && echo "regenerated model code is identical to the checked-in code" >&2
exit $status
