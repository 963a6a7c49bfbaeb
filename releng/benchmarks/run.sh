#!/usr/bin/env bash
# Builds and runs the JMH benchmarks: run.sh [JMH options], e.g. run.sh Fit -f 1 -wi 3 -i 5
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
"$here/../mvnw" -B -q -f "$here/pom.xml" package
exec java -jar "$here/target/benchmarks.jar" "$@"
