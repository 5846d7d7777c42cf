#!/bin/sh
# npm start: everything from a fresh clone to http://127.0.0.1:3000.
set -e
cd "$(dirname "$0")/.."
node scripts/ensure-deps.mjs
exec node --import tsx scripts/start.ts "$@"
