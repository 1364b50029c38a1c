#!/usr/bin/env bash
# npm start / npm run dev: set everything up, then serve the portal.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
mode=start
[ "${1:-}" = "--dev" ] && mode=dev
exec node scripts/stack.mjs "$mode"
