#!/usr/bin/env bash
# Starts the built product's workbench on a private X display, waits, and saves a screenshot of the
# whole screen as PNG: product-screenshot.sh <out.png> [seconds, default 25]
# Needs xvfb, x11-apps (xwd) and netpbm.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
out=$(realpath -m "$1"); wait=${2:-25}
product=$top/releng/org.tracegas.product/target/products/org.tracegas.product/linux/gtk/x86_64
[ -x "$product/tracegas-workbench" ] || { echo "build the product first: releng/build.sh" >&2; exit 1; }
display=:$((90 + RANDOM % 100))
Xvfb "$display" -screen 0 1280x900x24 >/dev/null 2>&1 &
xvfb=$!
data=$(mktemp -d)
trap 'kill $app $xvfb 2>/dev/null || true; rm -rf "$data"' EXIT
sleep 1
DISPLAY=$display TRACEGAS_DATA=$data "$product/tracegas-workbench" >"$data/app.log" 2>&1 &
app=$!
sleep "$wait"
DISPLAY=$display xwd -root -silent | xwdtopnm 2>/dev/null | pnmtopng > "$out"
kill $app 2>/dev/null || true
grep -i -E "exception|error" "$data/app.log" | head -20 || true
echo "screenshot: $out"
