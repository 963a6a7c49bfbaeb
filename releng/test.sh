#!/usr/bin/env bash
# Runs every test: the reactor's unit, integration and UI tests (UI tests under Xvfb when there is no
# display), the lab-server tests against a throw-away PostgreSQL server, the model's regeneration check and
# a lab add-on built, installed, updated and removed end to end (addons-end-to-end.sh).
# As root it first installs the system packages it needs (releng/install-prerequisites.sh); as another user it
# names the missing ones and how to install them, before building anything.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/releng/require-java.sh"
if [ "$(id -u)" = 0 ]; then
  "$top/releng/install-prerequisites.sh"
elif ! missing=$("$top/releng/install-prerequisites.sh" --check); then
  echo "releng/test.sh: these Debian packages are missing: $(echo $missing)" >&2
  echo "  install them as root with: sudo $top/releng/install-prerequisites.sh" >&2
  echo "  (or: sudo apt-get install $(echo $missing)), then run releng/test.sh again" >&2
  exit 1
fi
"$top/releng/fetch-swtchart.sh"

pgdir=$(mktemp -d "${TMPDIR:-/tmp}/tracegas-pg.XXXXXX")
# a free port of its own unless one is given, so that two runs at once (two users, two checkouts) do not meet
free_port() {
  local p
  for _ in $(seq 1 50); do
    p=$((20000 + RANDOM % 40000))
    (exec 3<>"/dev/tcp/127.0.0.1/$p") 2>/dev/null || { echo "$p"; return; }
  done
  echo "releng/test.sh: found no free port for the throw-away PostgreSQL server" >&2
  return 1
}
port=${TRACEGAS_TEST_PG_PORT:-$(free_port)}
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
