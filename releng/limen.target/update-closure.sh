#!/usr/bin/env bash
# Re-resolve the pinned platform closure from the roots in closure/pom.xml and print it as GAV lines.
# Review the diff against the <dependency> entries of limen.target, then update the target by hand.
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
top=$(cd "$here/../.." && pwd)
out="$here/closure/platform-closure.txt"
"$top/mvnw" -B -q -f "$here/closure/pom.xml" dependency:list -DoutputFile="$out.raw" -DexcludeTransitive=false -Dsort=true
grep -E '^\s+[^ ]+:[^ ]+:jar:' "$out.raw" | sed -E 's/^\s+//; s/:jar(:[^:]+)?:([^:]+):compile.*$/:\2/; s/:jar:/:/' | sort -u > "$out"
rm -f "$out.raw"
echo "wrote $out ($(wc -l < "$out") artifacts)"
