#!/usr/bin/env bash
# Installs MariaDB from Debian when mariadbd is missing, without letting the package start a system server.
set -euo pipefail
if command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; then exit 0; fi
echo "Installing mariadb-server from Debian…"
SUDO=""
[ "$(id -u)" -ne 0 ] && SUDO="sudo"
if [ ! -e /usr/sbin/policy-rc.d ]; then
  printf '#!/bin/sh\nexit 101\n' | $SUDO tee /usr/sbin/policy-rc.d >/dev/null
  $SUDO chmod +x /usr/sbin/policy-rc.d
  trap '$SUDO rm -f /usr/sbin/policy-rc.d' EXIT
fi
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq mariadb-server >/dev/null
