#!/usr/bin/env bash
# Installs what a fresh Debian machine lacks for the build and the tests: an X server for the UI tests,
# the GTK 3 libraries SWT needs, a PostgreSQL server for the lab-server tests, pdftoppm for report pages and
# unzip for fetching SWTChart. Java 17 is checked, not installed (releng/require-java.sh names the package).
#   install-prerequisites.sh           installs the missing packages (as root)
#   install-prerequisites.sh --check   prints the missing packages, one a line, and exits 1 if any is
#                                      missing; installs nothing, so any user may run it
set -euo pipefail
packages=(xvfb xauth libgtk-3-0 dbus-x11 postgresql poppler-utils unzip x11-apps netpbm)
need=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q 'install ok installed' || need+=("$p")
done
if [ "${1:-}" = --check ]; then
  [ ${#need[@]} -eq 0 ] || { printf '%s\n' "${need[@]}"; exit 1; }
  exit 0
fi
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" != 0 ]; then
    echo "install-prerequisites: installing needs root; missing Debian packages: ${need[*]}" >&2
    echo "  run: sudo $0   (or: sudo apt-get install ${need[*]})" >&2
    exit 1
  fi
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}"
fi
