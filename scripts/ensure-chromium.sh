#!/usr/bin/env bash
# Browser tests drive Debian's chromium; install it when missing.
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
echo "Installing chromium from Debian…"
SUDO=""
[ "$(id -u)" -ne 0 ] && SUDO="sudo"
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq chromium >/dev/null
