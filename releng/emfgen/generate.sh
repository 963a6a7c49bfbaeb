#!/usr/bin/env bash
# Regenerates the workspace model code (bundles/org.tracegas.model/src-gen) from model/workspace.genmodel.
# Plain Maven, outside the Tycho reactor; MVN may name another Maven (3.8 or newer).
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
"${MVN:-mvn}" -B -q -f "$here/pom.xml" compile exec:java
