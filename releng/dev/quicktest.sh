#!/usr/bin/env bash
# Fast inner loop for pure-Java core bundles, without Tycho: compiles the named bundles'
# src/ and src-test/ folders with javac and runs their JUnit 5 tests with the console launcher.
# The real build is ./mvnw verify; this script is only a developer convenience.
#   releng/dev/quicktest.sh limen.signal                 # test one bundle
#   releng/dev/quicktest.sh limen.fit limen.psychometric # first bundle's tests, others compiled too
#   QT_SELECT='--select-class=limen.fit.FooTest' releng/dev/quicktest.sh limen.fit
set -euo pipefail
top=$(cd "$(dirname "$0")/../.." && pwd)
repo=${MAVEN_REPO:-$HOME/.m2/repository}
[ $# -ge 1 ] || { echo "usage: $0 BUNDLE [BUNDLE...]" >&2; exit 2; }
jar() { local p="$repo/$1"; [ -f "$p" ] || { echo "missing $p: mvn dependency:get -Dartifact=..." >&2; exit 2; }; printf '%s' "$p"; }
cp="$(jar org/apache/commons/commons-math3/3.6.1/commons-math3-3.6.1.jar)"
cp="$cp:$(jar org/junit/platform/junit-platform-console-standalone/1.12.2/junit-platform-console-standalone-1.12.2.jar)"
for extra in info/picocli/picocli/4.7.7/picocli-4.7.7.jar org/apache/commons/commons-csv/1.14.1/commons-csv-1.14.1.jar \
  commons-io/commons-io/2.20.0/commons-io-2.20.0.jar commons-codec/commons-codec/1.19.0/commons-codec-1.19.0.jar \
  org/eclipse/emf/org.eclipse.emf.common/2.46.0/org.eclipse.emf.common-2.46.0.jar \
  org/eclipse/emf/org.eclipse.emf.ecore/2.43.0/org.eclipse.emf.ecore-2.43.0.jar \
  org/eclipse/emf/org.eclipse.emf.ecore.xmi/2.41.0/org.eclipse.emf.ecore.xmi-2.41.0.jar; do
  [ -f "$repo/$extra" ] && cp="$cp:$repo/$extra"
done
out=$(mktemp -d); trap 'rm -rf "$out"' EXIT
srcs=(); tests=(); res=()
for b in "$@"; do
  d="$top/bundles/$b"; [ -d "$d" ] || d="$top/$b"
  for s in src src-gen; do [ -d "$d/$s" ] && srcs+=("$d/$s"); done
  [ -d "$d/src-test" ] && tests+=("$d/src-test")
  [ -d "$d/resources-test" ] && res+=("$d/resources-test")
done
mkdir -p "$out/main" "$out/test"
find "${srcs[@]}" -name '*.java' > "$out/main.txt"
javac -nowarn -encoding UTF-8 --release 17 -d "$out/main" -cp "$cp" @"$out/main.txt"
for s in "${srcs[@]}"; do (cd "$s" && find . -type f ! -name '*.java' -exec cp --parents {} "$out/main/" \;); done
first="$top/bundles/$1"; [ -d "$first" ] || first="$top/$1"
if [ -d "$first/src-test" ]; then
  find "$first/src-test" -name '*.java' > "$out/test.txt"
  javac -nowarn -encoding UTF-8 --release 17 -d "$out/test" -cp "$cp:$out/main" @"$out/test.txt"
  (cd "$first/src-test" && find . -type f ! -name '*.java' -exec cp --parents {} "$out/test/" \;)
  [ -d "$first/resources-test" ] && cp -r "$first/resources-test/." "$out/test/"
  java -cp "$cp:$out/main:$out/test" org.junit.platform.console.ConsoleLauncher execute --disable-banner \
    --details=summary ${QT_SELECT:---scan-classpath="$out/test"} 
else
  echo "compiled; no src-test in $first"
fi
