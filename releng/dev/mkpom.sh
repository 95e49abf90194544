#!/usr/bin/env bash
# Writes the small pom.xml of a bundle or feature folder (explicit POMs rather than Tycho's pomless mode:
# pomless writes temporary .polyglot.* files into the source folder, which breaks concurrent builds).
#   releng/dev/mkpom.sh bundles/limen.thing [eclipse-plugin|eclipse-test-plugin|eclipse-feature]
set -euo pipefail
dir=${1:?folder}; packaging=${2:-}
name=$(basename "$dir")
parent=$(basename "$(dirname "$dir")")
if [ -z "$packaging" ]; then
  if [ -f "$dir/feature.xml" ]; then packaging=eclipse-feature
  elif [[ "$name" == *.tests ]]; then packaging=eclipse-test-plugin
  else packaging=eclipse-plugin; fi
fi
[ -f "$dir/pom.xml" ] && { echo "$dir/pom.xml exists" >&2; exit 0; }
cat > "$dir/pom.xml" <<POM
<?xml version="1.0" encoding="UTF-8"?>
<project xmlns="http://maven.apache.org/POM/4.0.0" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
         xsi:schemaLocation="http://maven.apache.org/POM/4.0.0 https://maven.apache.org/xsd/maven-4.0.0.xsd">
  <modelVersion>4.0.0</modelVersion>
  <parent>
    <groupId>dev.limen</groupId>
    <artifactId>$parent</artifactId>
    <version>0.1.0-SNAPSHOT</version>
  </parent>
  <artifactId>$name</artifactId>
  <version>0.1.0-SNAPSHOT</version>
  <packaging>$packaging</packaging>
</project>
POM
echo "wrote $dir/pom.xml ($packaging)"
