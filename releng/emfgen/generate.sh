#!/usr/bin/env bash
# Regenerates the workspace model code (bundles/org.tracegas.model/src-gen) and its item providers
# (bundles/org.tracegas.model.edit/src-gen, icons, plugin.xml) from model/workspace.genmodel.
# Plain Maven, outside the Tycho reactor, through the project's Maven wrapper (MVN may name another Maven).
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
"${MVN:-$here/../mvnw}" -B -q -f "$here/pom.xml" compile exec:java
