#!/usr/bin/env bash
# npm run dev: the API (with its MariaDB) on PORT and Vite with hot reload on 5173, proxying /api.
set -euo pipefail
cd "$(dirname "$0")/.."
export PATH="/usr/sbin:$PATH"
bash scripts/ensure-deps.sh
bash scripts/ensure-mariadb.sh
node_modules/.bin/tsx scripts/serve.ts &
api=$!
trap 'kill $api 2>/dev/null; wait $api 2>/dev/null' EXIT INT TERM
node_modules/.bin/vite
