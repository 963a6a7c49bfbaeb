#!/usr/bin/env bash
# Installs what a fresh Debian machine lacks for the build and the tests: an X server for the UI tests,
# the GTK 3 libraries SWT needs, a PostgreSQL server for the lab-server tests and pdftoppm for report pages.
set -euo pipefail
need=()
for p in xvfb xauth libgtk-3-0 dbus-x11 postgresql poppler-utils unzip x11-apps netpbm; do
  dpkg -s "$p" >/dev/null 2>&1 || need+=("$p")
done
if [ ${#need[@]} -gt 0 ]; then
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}"
fi
