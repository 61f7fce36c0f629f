#!/usr/bin/env bash
# npm start: everything from a fresh clone to a served app.
set -euo pipefail
cd "$(dirname "$0")/.."
export PATH="/usr/sbin:$PATH"
bash scripts/ensure-deps.sh
bash scripts/ensure-mariadb.sh
echo "Building the client…"
node_modules/.bin/vite build --logLevel warn
export NODE_ENV="${NODE_ENV:-production}"
exec node_modules/.bin/tsx scripts/serve.ts
