#!/usr/bin/env bash
# Installs node_modules from the lockfile when missing or when package-lock.json changed since the last install.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
stamp=node_modules/.glassgrade-lock.sha256
want="$(sha256sum package-lock.json | cut -d' ' -f1)"
if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$want" ]; then
  echo "[deps] installing node modules (npm ci)" >&2
  npm ci --no-audit --no-fund --loglevel=error
  echo "$want" > "$stamp"
fi
