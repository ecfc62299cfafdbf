#!/usr/bin/env bash
# `npm test`: sets everything up on a database of its own, then lint, type-check, vitest
# (shared, server against real PostgreSQL, client) and the browser tests.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
trap stop_postgres_if_ours EXIT

ensure_node_modules
ensure_chromium_installed
if [ -z "${TEST_DATABASE_URL:-}" ]; then
  start_postgres
  ensure_database arcwise_test fresh
  export TEST_DATABASE_URL="$(local_database_url arcwise_test)"
fi
export DATABASE_URL="$TEST_DATABASE_URL"
export TSX_TSCONFIG_PATH="$ROOT/tsconfig.json"
export NODE_ENV=test

status=0
step() {
  local name="$1"; shift
  log "── $name"
  if "$@"; then log "── $name: passed"; else log "── $name: FAILED"; status=1; fi
}
step lint npx eslint . --max-warnings 0
step format npx prettier --check . --log-level warn
step typecheck npx tsc --noEmit -p tsconfig.json
step vitest npx vitest run
step browser npx vitest run --config tests/browser/vitest.browser.config.ts
if [ "$status" = "0" ]; then log "all test steps passed"; else log "some test steps failed"; fi
exit "$status"
