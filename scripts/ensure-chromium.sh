#!/usr/bin/env bash
# Installs Debian's Chromium for the end-to-end tests when it is missing (never a browser download of a test tool).
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
if [ "$(id -u)" = 0 ]; then
  echo "installing Debian's chromium for the end-to-end tests…" >&2
  apt-get update -qq >/dev/null
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
else
  echo "Chromium is missing: run 'sudo apt-get install -y chromium' and try again." >&2
  exit 1
fi
