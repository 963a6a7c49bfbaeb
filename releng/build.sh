#!/usr/bin/env bash
# Builds every bundle, the features, the p2 repository and the product, without running the tests.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
"$top/releng/fetch-swtchart.sh"
cd "$top"
exec "$top/releng/mvnw" -B -f "$top/pom.xml" verify -DskipTests "$@"
