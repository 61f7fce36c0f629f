#!/usr/bin/env bash
# npm run bench: analysis and register timings on invented jars in a throwaway MariaDB (prints figures, asserts nothing).
# A plain run seeds 200,000 jars; BENCH_SIZES=200000,1000000 runs both sizes in one go (see scripts/bench-analysis.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
export PATH="/usr/sbin:$PATH"
bash scripts/ensure-deps.sh
bash scripts/ensure-mariadb.sh
node_modules/.bin/tsx scripts/bench-fisher.ts
# The app runs as npm start runs it: with the semi-space that start.sh sets (see there).
export NODE_OPTIONS="--max-semi-space-size=64 ${NODE_OPTIONS:-}"
exec node_modules/.bin/tsx scripts/bench-analysis.ts "$@"
