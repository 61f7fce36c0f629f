#!/usr/bin/env bash
# npm run bench: analysis timings on 200,000 invented jars in a throwaway MariaDB (prints figures, asserts nothing).
set -euo pipefail
cd "$(dirname "$0")/.."
export PATH="/usr/sbin:$PATH"
bash scripts/ensure-deps.sh
bash scripts/ensure-mariadb.sh
node_modules/.bin/tsx scripts/bench-fisher.ts
# The app runs as npm start runs it: with the semi-space that start.sh sets (see there).
export NODE_OPTIONS="--max-semi-space-size=64 ${NODE_OPTIONS:-}"
exec node_modules/.bin/tsx scripts/bench-analysis.ts "$@"
