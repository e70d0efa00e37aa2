#!/usr/bin/env bash
# Debian's Chromium drives the end-to-end tests; no browser is ever downloaded by a test tool.
set -euo pipefail
if ! [ -x /usr/bin/chromium ]; then
  echo "[e2e] installing Debian's chromium package" >&2
  sudo_cmd=""; [ "$(id -u)" -eq 0 ] || sudo_cmd="sudo"
  $sudo_cmd apt-get update -qq
  $sudo_cmd env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
fi
