#!/bin/sh
# npm test: from a fresh clone to "N passed, N failed".
set -e
cd "$(dirname "$0")/.."
node scripts/ensure-deps.mjs
exec node --import tsx scripts/test.ts "$@"
