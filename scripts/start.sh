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
# A causes request reads some 13 k combinations at 200 k jars and keeps them while it works; with V8's
# default 16 MiB semi-space a large share of its time went to scavenges copying them (npm run bench, README).
export NODE_OPTIONS="--max-semi-space-size=64 ${NODE_OPTIONS:-}"
exec node_modules/.bin/tsx scripts/serve.ts
