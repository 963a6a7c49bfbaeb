#!/usr/bin/env bash
# Fails when the committed model or edit code differs from what the genmodel generates: deletes the
# generated code of both bundles (the edit bundle's icons and plugin.xml too, which the generator only writes
# when missing), regenerates it and compares with git (changed, deleted and new files). plugin.properties
# keeps its hand-worded labels: the generator only adds the keys it misses, which then show as a difference.
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
bundles=$(cd "$here/../../bundles" && pwd)
model="$bundles/org.tracegas.model"
edit="$bundles/org.tracegas.model.edit"
rm -rf "$model/src-gen" "$edit/src-gen" "$edit/icons" "$edit/plugin.xml"
"$here/generate.sh"
status=0
for bundle in "$model" "$edit"; do
  git -C "$bundle" diff --exit-code -- src-gen plugin.xml plugin.properties icons || status=1
  untracked=$(git -C "$bundle" ls-files --others --exclude-standard -- src-gen icons plugin.xml plugin.properties)
  if [ -n "$untracked" ]; then
    echo "generated files missing from the repository:" >&2
    echo "$untracked" >&2
    status=1
  fi
done
exit $status
