#!/usr/bin/env bash
# Installs the npm dependencies when node_modules is missing or older than the lock file.
set -euo pipefail
cd "$(dirname "$0")/.."
stamp=node_modules/.isotrope-lock
want=$(sha256sum package-lock.json | cut -d' ' -f1)
if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$want" ]; then
  echo "[isotrope] installing npm dependencies (npm ci) …"
  PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1 npm ci --no-audit --no-fund --loglevel=error
  echo "$want" > "$stamp"
fi
