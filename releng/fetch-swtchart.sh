#!/usr/bin/env bash
# Puts SWTChart, which is not on Maven Central, into the local Maven repository where the target
# platform (target-platform/tracegas.target) finds it: Debian's package libeclipse-swtchart-java carries
# the bundle. Does nothing when the bundle is already there.
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
version=0.13.0
repo=${MAVEN_REPO_LOCAL:-$HOME/.m2/repository}
dest=$repo/org/eclipse/swtchart/org.eclipse.swtchart/$version
[ -f "$dest/org.eclipse.swtchart-$version.jar" ] && exit 0

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
cd "$work"
if ! apt-get download libeclipse-swtchart-java >/dev/null 2>&1; then
  # a fresh machine may have no package lists yet
  apt-get update -qq >/dev/null
  apt-get download libeclipse-swtchart-java
fi
dpkg -x libeclipse-swtchart-java_*.deb extracted
jar=extracted/usr/share/java/org.eclipse.swtchart.jar
[ -f "$jar" ] || { echo "fetch-swtchart: $jar not found in the Debian package" >&2; exit 1; }
unzip -p "$jar" META-INF/MANIFEST.MF | grep -q '^Bundle-SymbolicName: org.eclipse.swtchart' \
  || { echo "fetch-swtchart: $jar is not the org.eclipse.swtchart bundle" >&2; exit 1; }
# the POM embedded in the jar names a parent that is not published: install with a POM of our own
cat > pom.xml <<POM
<project xmlns="http://maven.apache.org/POM/4.0.0">
  <modelVersion>4.0.0</modelVersion>
  <groupId>org.eclipse.swtchart</groupId>
  <artifactId>org.eclipse.swtchart</artifactId>
  <version>$version</version>
  <description>SWTChart $version as packaged by Debian (libeclipse-swtchart-java)</description>
</project>
POM
mkdir -p "$dest"
cp "$jar" "$dest/org.eclipse.swtchart-$version.jar"
cp pom.xml "$dest/org.eclipse.swtchart-$version.pom"
echo "fetch-swtchart: installed SWTChart $version into $dest"
