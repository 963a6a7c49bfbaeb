#!/usr/bin/env bash
# Runs the demo campaign end to end on the embedded H2 default: builds the product when it is missing,
# then lets the headless runner synthesize, import, process, quantify, check and report the campaign.
# The workspace lives in workspace-data/demo; a second run reuses it. Extra arguments go to the runner.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/releng/require-java.sh"
product=$top/releng/org.tracegas.product/target/products/org.tracegas.product/linux/gtk/x86_64
if [ ! -x "$product/tracegas" ] || [ -n "$(find "$top/bundles" "$top/features" -newer "$product/tracegas" -name '*.java' -print -quit)" ]; then
  # the build takes SWTChart from Debian's package, which needs unzip
  command -v unzip >/dev/null || { echo "releng/demo.sh: building needs unzip; install it with: sudo apt-get install unzip" >&2; exit 1; }
  "$top/releng/build.sh" -q
fi
exec "$product/tracegas" demo --workspace "$top/workspace-data/demo" --out "$top/workspace-data/demo-report" "$@"
