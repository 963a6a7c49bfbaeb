#!/usr/bin/env bash
# Fails when the committed model code differs from what the genmodel generates:
# deletes src-gen, regenerates it and compares with git.
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
bundle="$here/../../bundles/org.tracegas.model"
rm -rf "$bundle/src-gen"
"$here/generate.sh"
git -C "$bundle" add -N src-gen
git -C "$bundle" diff --exit-code -- src-gen plugin.xml
