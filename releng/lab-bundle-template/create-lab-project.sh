#!/usr/bin/env bash
# Creates a lab's own add-on project for Tracegas Workbench from the skeleton beside this script: a reader
# bundle, its test fragment, a feature and a p2 repository, built with Maven and Tycho against the
# workbench's published p2 repository and Maven Central. The project holds no sources of the workbench.
#
#   create-lab-project.sh --into <new folder> --bundle <bundle id> --reader <class name>
#                         --name "<what the reader reads>" --vendor "<lab>" --header "<first line of a file>"
#                         [--package <java package>] [--version <x.y.z>] [--repository <p2 repository>]
#
# --bundle is the bundle's symbolic name (lower case, dotted, e.g. org.example.lab.reader); --package
# defaults to it; --version defaults to 1.0.0; --repository (a folder or URL) defaults to the p2 repository
# of the workbench build this script belongs to. Then: cd <new folder>; ./mvnw verify; and install
# repository/target/repository with tracegas-addons.
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
usage() { sed -n '6,8s/^# //p' "$0" >&2; exit 2; }
fail() { echo "create-lab-project: $*" >&2; exit 2; }

into= bundle= reader= name= vendor= header= package= version=1.0.0
repository=$here/../org.tracegas.product/target/repository
while [ $# -gt 0 ]; do
  [ $# -ge 2 ] || usage
  case "$1" in
    --into) into=$2 ;; --bundle) bundle=$2 ;; --reader) reader=$2 ;; --name) name=$2 ;;
    --vendor) vendor=$2 ;; --header) header=$2 ;; --package) package=$2 ;; --version) version=$2 ;;
    --repository) repository=$2 ;;
    *) fail "unknown option $1" ;;
  esac
  shift 2
done
[ -n "$into" ] && [ -n "$bundle" ] && [ -n "$reader" ] && [ -n "$name" ] && [ -n "$vendor" ] && [ -n "$header" ] \
  || usage
package=${package:-$bundle}
[[ $bundle =~ ^[a-z][a-z0-9_]*(\.[a-z][a-z0-9_]*)+$ ]] || fail "--bundle $bundle: give a dotted lower-case id such as org.example.lab.reader"
[[ $bundle != org.tracegas.* ]] || fail "--bundle $bundle: org.tracegas.* belongs to the workbench; use your lab's own name"
[[ $package =~ ^[a-z][a-z0-9_]*(\.[a-z][a-z0-9_]*)+$ ]] || fail "--package $package: give a dotted lower-case Java package"
[[ $reader =~ ^[A-Z][A-Za-z0-9_]*$ ]] || fail "--reader $reader: give a Java class name such as AcmeReader"
[[ $version =~ ^[0-9]+\.[0-9]+\.[0-9]+$ ]] || fail "--version $version: give major.minor.micro, e.g. 1.0.0"
for text in "$name" "$vendor" "$header"; do
  case "$text" in
    *[\<\>\&\"\\@\|]*) fail "\"$text\": leave out < > & \" \\ | and @" ;;
  esac
done
[ ! -e "$into" ] || fail "--into $into exists already; name a new folder"
case "$repository" in
  *:*) repository_url=$repository ;;
  *) [ -d "$repository" ] || fail "--repository $repository: no such folder (build the workbench first, or give its URL)"
     repository_url=file:$(cd "$repository" && pwd) ;;
esac
group=${bundle%.*}

mkdir -p "$into"
(cd "$here/skeleton" && find . -type f) | while read -r source; do
  target=${source//__BUNDLE__/$bundle}
  target=${target//__PACKAGE_PATH__/${package//.//}}
  target=${target//__READER__/$reader}
  mkdir -p "$(dirname "$into/$target")"
  # the replacement texts were checked above to hold neither the | that delimits sed's patterns nor XML's specials
  sed -e "s|@BUNDLE@|$bundle|g" -e "s|@PACKAGE@|$package|g" -e "s|@READER@|$reader|g" -e "s|@NAME@|$name|g" \
      -e "s|@VENDOR@|$vendor|g" -e "s|@HEADER@|$header|g" -e "s|@VERSION@|$version|g" -e "s|@GROUP@|$group|g" \
      -e "s|@REPOSITORY@|$repository_url|g" "$here/skeleton/$source" > "$into/$target"
done
# Maven 3.9 or newer runs Tycho 4: the project gets the workbench's Maven wrapper
cp "$here/../mvnw" "$into/mvnw"
mkdir -p "$into/.mvn/wrapper"
cp "$here/../.mvn/wrapper/maven-wrapper.properties" "$into/.mvn/wrapper/"
echo "created $into: build it with (cd $into && ./mvnw verify); the add-on's p2 repository is then"
echo "$into/repository/target/repository"
