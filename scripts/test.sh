#!/usr/bin/env bash
# npm test: set up its own database and services, then run every suite.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
exec node scripts/stack.mjs test
