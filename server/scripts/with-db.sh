#!/usr/bin/env bash
# Runs a command with the demo database up: `bash server/scripts/with-db.sh CMD…`.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
trap stop_postgres_if_ours EXIT
ensure_node_modules
if [ -z "${DATABASE_URL:-}" ]; then
  start_postgres
  ensure_database "${ARCWISE_DB:-arcwise}"
  export DATABASE_URL="$(local_database_url "${ARCWISE_DB:-arcwise}")"
fi
export TSX_TSCONFIG_PATH="$ROOT/tsconfig.json"
npx tsx server/db/migrate.ts
"$@"
