#!/usr/bin/env bash
# Makes sure the machine has what the test suite needs beyond npm packages: Debian's chromium for
# the browser tests (never a downloaded browser). Installs it with apt-get when run as root.
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing Debian's chromium for the browser tests…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
else
  echo "The browser tests need Debian's chromium at /usr/bin/chromium: sudo apt-get install -y chromium" >&2
  exit 1
fi
