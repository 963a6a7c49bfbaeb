#!/usr/bin/env bash
# Checks that Java 17 or later is there to build and run the product (the java of JAVA_HOME, else the one on
# the PATH), and says what to install when it is not. Exit status 1 when it is missing or too old.
set -euo pipefail
java=${JAVA_HOME:+$JAVA_HOME/bin/java}
java=${java:-$(command -v java || true)}
how="install it on Debian with: sudo apt-get install openjdk-17-jdk-headless (then run this again)"
if [ -z "$java" ] || [ ! -x "$java" ]; then
  echo "Java 17 or later is needed and none was found (neither \$JAVA_HOME nor java on the PATH); $how" >&2
  exit 1
fi
# 'java -version' prints e.g.: openjdk version "17.0.15" 2025-04-15 (1.8 and older print "1.8.0_...")
version=$("$java" -version 2>&1 | sed -n 's/.*version "\([0-9][0-9]*\)[."].*/\1/p' | head -n 1)
if [ -z "$version" ] || [ "$version" -lt 17 ]; then
  echo "Java 17 or later is needed; $java is version ${version:-unknown}; $how" >&2
  exit 1
fi
