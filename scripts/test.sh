#!/usr/bin/env bash
# npm test: install what is missing, then run every suite against a private
# PostgreSQL cluster and a freshly built server. Extra arguments go to vitest.
cd "$(dirname "$0")/.."
source scripts/lib/bootstrap.sh
ensure_node_modules
ensure_postgres
ensure_chromium
exec node --import tsx scripts/test.ts "$@"
