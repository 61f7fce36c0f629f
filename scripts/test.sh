#!/usr/bin/env bash
# npm test: set-up, type-check, lint, then every test (unit, API, browser) on a throwaway MariaDB.
set -euo pipefail
cd "$(dirname "$0")/.."
export PATH="/usr/sbin:$PATH"
started=$(date +%s)
bash scripts/ensure-deps.sh
bash scripts/ensure-mariadb.sh
bash scripts/ensure-chromium.sh
echo "== typecheck"; npm run --silent typecheck
echo "== lint"; npm run --silent lint
echo "== format"; node_modules/.bin/prettier --check --log-level warn .
echo "== build"; node_modules/.bin/vite build --logLevel warn
echo "== tests"
NODE_ENV=test node_modules/.bin/vitest run "$@"
echo "npm test took $(( $(date +%s) - started )) s"
