#!/usr/bin/env bash
# Runs every test: the reactor's unit, integration and UI tests (UI tests under Xvfb when there is no
# display), the lab-server tests against a throw-away PostgreSQL server, the model's regeneration check and
# a lab add-on built, installed, updated and removed end to end (addons-end-to-end.sh).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/releng/fetch-swtchart.sh"

pgdir=$(mktemp -d /tmp/tracegas-pg.XXXXXX)
port=${TRACEGAS_TEST_PG_PORT:-55433}
trap '"$top/releng/postgres-throwaway.sh" stop "$pgdir"' EXIT
url=$("$top/releng/postgres-throwaway.sh" start "$pgdir" "$port")

run=("$top/releng/mvnw" -B -f "$top/pom.xml" clean verify "-Dtracegas.test.pg.url=$url" "$@")
if [ -z "${DISPLAY:-}" ]; then
  xvfb-run -a -s "-screen 0 1280x1024x24" "${run[@]}"
else
  "${run[@]}"
fi

echo "== the generated model code matches what its genmodel generates"
"$top/releng/emfgen/check.sh"

echo "== the bundles' API against the last release (releng/api-baseline)"
"$top/releng/api-baseline/check.sh"

echo "== a lab's add-on: built from the template outside the reactor, installed, used, updated, removed"
"$top/releng/addons-end-to-end.sh"

echo "== coverage-guided fuzzing of the JCAMP-DX reader (bounded time)"
"$top/releng/fuzz/run.sh"
