#!/usr/bin/env bash
# npm start: install what is missing, then run PostgreSQL and the app together.
cd "$(dirname "$0")/.."
source scripts/lib/bootstrap.sh
ensure_node_modules
ensure_postgres
exec node --import tsx scripts/start.ts "$@"
