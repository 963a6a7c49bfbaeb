#!/usr/bin/env bash
# Fails when the committed model code differs from what the genmodel generates:
# deletes src-gen, regenerates it and compares with git (changed, deleted and new files).
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
bundle=$(cd "$here/../../bundles/org.tracegas.model" && pwd)
rm -rf "$bundle/src-gen"
"$here/generate.sh"
git -C "$bundle" diff --exit-code -- src-gen plugin.xml
untracked=$(git -C "$bundle" ls-files --others --exclude-standard -- src-gen)
if [ -n "$untracked" ]; then
  echo "generated files missing from the repository:" >&2
  echo "$untracked" >&2
  exit 1
fi
