#!/usr/bin/env bash
# Makes sure the machine has what the test suite needs beyond npm packages: Debian's chromium for
# the browser tests (never a downloaded browser) and redis-server for the shared burst-limiter test.
# Installs them with apt-get when run as root.
set -euo pipefail
missing=()
[ -x /usr/bin/chromium ] || missing+=(chromium)
[ -x /usr/bin/redis-server ] || missing+=(redis-server)
[ ${#missing[@]} -eq 0 ] && exit 0
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing Debian packages for the tests: ${missing[*]}"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
else
  echo "The tests need these Debian packages: sudo apt-get install -y ${missing[*]}" >&2
  exit 1
fi
