#!/usr/bin/env bash
# Fails when a bundle built by the reactor exports a package without a version, or changed a package that
# the last release exported as API incompatibly without a major version step (bnd's baseline analysis
# against baseline/<release>/, the release named by apibaseline.release in pom.xml). Run after the build.
# Plain Maven, outside the Tycho reactor, through the project's Maven wrapper (MVN may name another Maven).
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
"${MVN:-$here/../mvnw}" -B -q -f "$here/pom.xml" compile exec:java -Dapibaseline.mode=check "$@"
