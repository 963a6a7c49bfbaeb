#!/usr/bin/env bash
# The life of a lab's add-on, end to end, against the product the reactor has just built: the workbench's
# example reader is built as a lab's own project from the lab-bundle template, outside the reactor, against
# the product's p2 repository; tracegas-addons installs it into a copy of the product; the runner imports a
# file of the example instrument with it; a rebuilt add-on replaces it (update); removal takes it out again.
# Prints the time of each step. Extra Maven options come from MAVEN_ARGS (e.g. -o).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
# the workbench's example reader bundle and its tests: the add-on built here
example=$top/bundles/org.tracegas.importer.example
example_tests=$example.tests
product=$top/releng/org.tracegas.product/target/products/org.tracegas.product/linux/gtk/x86_64
repository=$top/releng/org.tracegas.product/target/repository
[ -x "$product/tracegas-addons" ] && [ -d "$repository" ] || { echo "build the product first (releng/build.sh)" >&2; exit 2; }

work=$(mktemp -d /tmp/tracegas-addons.XXXXXX)
trap 'rm -rf "$work"' EXIT
started=$(date +%s)
step() { echo "== [$(( $(date +%s) - started )) s] $*"; }
fail() { echo "addons end to end: $*" >&2; exit 1; }

# the reader's package and class as the example bundle declares them, so a renamed example needs no edit here
package=$(sed -n 's/^Export-Package: *\([a-z0-9_.]*\).*/\1/p' "$example/META-INF/MANIFEST.MF" | head -n 1)
class=$(grep -o 'class="[^"]*"' "$example/plugin.xml" | head -n 1 | sed 's/class="\(.*\)"/\1/')
reader=${class##*.}
sample=$(find "$example_tests/src" -name '*.txt' | head -n 1)
[ -n "$package" ] && [ -n "$reader" ] && [ -n "$sample" ] || fail "cannot find the example reader's package, class or sample in $example"
format=$(grep -o 'new ImportedData(source, "[^"]*"' "$example/src/${package//.//}/$reader.java" | sed 's/.*, "\(.*\)"/\1/')

step "create the lab's project from the template"
lab=$work/lab
"$top/releng/lab-bundle-template/create-lab-project.sh" --into "$lab" --bundle org.example.lab.exportreader \
  --package "$package" --reader "$reader" --name "Example FTIR export (lab add-on)" --vendor "Example lab" \
  --header "EXAMPLE FTIR EXPORT" --repository "$repository" >/dev/null
# the example reader's own code and tests take the place of the template's starting point
rm -rf "$lab/org.example.lab.exportreader/src" "$lab/org.example.lab.exportreader.tests/src"
cp -r "$example/src" "$example/plugin.xml" "$lab/org.example.lab.exportreader/"
cp -r "$example_tests/src" "$lab/org.example.lab.exportreader.tests/"
grep -rqE "org.tracegas.parent|relativePath|\.\./" "$lab/pom.xml" "$lab"/*/pom.xml && fail "the lab's project refers to the workbench's build"

step "build it outside the reactor against the product's p2 repository (with its tests)"
(cd "$lab" && ./mvnw -B -q verify) || fail "the lab's project does not build"
labrepo=$lab/repository/target/repository

step "install it into a copy of the product, which has opened a workspace before"
cp -a "$product" "$work/product"
installation=$work/product
export TRACEGAS_PASSWORD=end-to-end-only
ws=$work/workspace
"$installation/tracegas" workspace-init --workspace "$ws" --admin admin --name "Test Administrator" >/dev/null
"$installation/tracegas" project-add --workspace "$ws" --as admin --client "Northfield Lime Works" \
  --code NLW-1 --name "Kiln stack" >/dev/null
"$installation/tracegas-addons" install "$labrepo" org.example.lab.exportreader.feature >"$work/install.log" 2>&1 \
  || { cat "$work/install.log"; fail "install failed"; }
"$installation/tracegas-addons" list 2>/dev/null | grep -q '^org.example.lab.exportreader.feature.feature.group/' \
  || fail "the installed feature is not listed"

step "import a file of the example instrument with the runner"
# the example export states no cell conditions: the lab gives them, as it would for such files
"$installation/tracegas" import --workspace "$ws" --as admin --project NLW-1 --file "$sample" \
  --cell-temperature 313.15 --cell-pressure 1009 >"$work/import.log" 2>&1 \
  || { cat "$work/import.log"; fail "the import failed"; }
grep -qF "as $format" "$work/import.log" || { cat "$work/import.log"; fail "the file was not read by the add-on's reader"; }
grep -F "as $format" "$work/import.log"

step "update it from a rebuilt repository"
before=$("$installation/tracegas-addons" list 2>/dev/null | grep '^org.example.lab.exportreader.feature.feature.group/')
# a later qualifier than the first build's, even within the same minute
(cd "$lab" && ./mvnw -B -q verify -DskipTests "-DforceContextQualifier=$(date -u +%Y%m%d%H%M)-update") \
  || fail "the rebuild failed"
"$installation/tracegas-addons" update "$labrepo" org.example.lab.exportreader.feature >"$work/update.log" 2>&1 \
  || { cat "$work/update.log"; fail "update failed"; }
after=$("$installation/tracegas-addons" list 2>/dev/null | grep '^org.example.lab.exportreader.feature.feature.group/')
[ "$before" != "$after" ] || fail "update left $before in place"
echo "$before -> $after"

step "remove it"
"$installation/tracegas-addons" remove org.example.lab.exportreader.feature >"$work/remove.log" 2>&1 \
  || { cat "$work/remove.log"; fail "remove failed"; }
! "$installation/tracegas-addons" list 2>/dev/null | grep -q '^org.example.lab.exportreader' || fail "still installed after remove"
grep -q org.example.lab.exportreader "$installation/configuration/org.eclipse.equinox.simpleconfigurator/bundles.info" \
  && fail "the bundle is still in the bundle list"
"$installation/tracegas" import --workspace "$ws" --as admin --project NLW-1 --file "$sample" \
  --cell-temperature 313.15 --cell-pressure 1009 >"$work/import2.log" 2>&1 || true
grep -qF "as $format" "$work/import2.log" && fail "the removed reader still reads files"
step "the workspace's audit trail holds the software of each opening that changed it"
h2=$(ls "$installation"/plugins/com.h2database_*.jar | head -n 1)
audit=$(ls "$installation"/plugins/org.tracegas.audit_*.jar | head -n 1)
printf 'maxwidth 100000\nSELECT action, new_value, reason FROM audit_record WHERE object_type = %s ORDER BY seq;\n' \
  "'installed-software'" | java -cp "$h2:$audit" org.h2.tools.Shell -url "jdbc:h2:file:$ws/db/workspace" -user "" \
  -password "" > "$work/audit.txt"
grep -E "^(ACTION|CREATE|CHANGE) " "$work/audit.txt"
[ "$(grep -c 'Tracegas Workbench' "$work/audit.txt")" -eq 3 ] || fail "expected 3 software records (before, with, after the add-on)"
grep 'CHANGE' "$work/audit.txt" | grep -q "with org.example.lab.exportreader.feature 1.0.0" \
  || fail "no record of the software with the add-on"
grep -q "${USER:-$(id -un)} install org.example.lab.exportreader.feature from file:" "$work/audit.txt" \
  || fail "the record does not say who installed the add-on"
step "done"
