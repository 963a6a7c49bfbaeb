#!/usr/bin/env bash
# At a release: records the API of the bundles the reactor just built as baseline/<release>/ (their manifests
# and the classes of their exported, non-internal packages), then set apibaseline.release in pom.xml to it.
#   record.sh <release version>      e.g. record.sh 0.2.0
set -euo pipefail
here=$(cd "${0%/*}" && pwd)
[ $# -eq 1 ] && [[ $1 =~ ^[0-9]+\.[0-9]+\.[0-9]+$ ]] || { echo "usage: record.sh <release version x.y.z>" >&2; exit 2; }
[ ! -e "$here/baseline/$1" ] || { echo "record.sh: baseline/$1 exists already" >&2; exit 2; }
"${MVN:-$here/../mvnw}" -B -q -f "$here/pom.xml" compile exec:java -Dapibaseline.mode=record -Dapibaseline.release="$1"
