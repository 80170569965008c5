#!/usr/bin/env bash
# npm start: install what is missing, then hand over to the orchestrator.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "betasift: installing dependencies (npm ci)"
  npm ci --no-audit --no-fund
fi
exec ./node_modules/.bin/tsx app/ops/start.server.ts
