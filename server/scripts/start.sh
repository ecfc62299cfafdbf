#!/usr/bin/env bash
# `npm start`: sets everything up and serves Arcwise with the demo data on http://localhost:3000.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"

SERVER_PID=""
cleanup() {
  trap - INT TERM EXIT
  if [ -n "$SERVER_PID" ] && kill -0 "$SERVER_PID" 2>/dev/null; then
    kill -TERM "$SERVER_PID" 2>/dev/null || true
    wait "$SERVER_PID" 2>/dev/null || true
  fi
  stop_postgres_if_ours
}
trap cleanup INT TERM EXIT

ensure_node_modules
if [ -z "${DATABASE_URL:-}" ]; then
  start_postgres
  ensure_database arcwise
  export DATABASE_URL="$(local_database_url arcwise)"
fi
export NODE_ENV=production
export SESSION_SECRET="${SESSION_SECRET:-$(ensure_session_secret)}"
export TSX_TSCONFIG_PATH="$ROOT/tsconfig.json"

log "migrating and seeding the demo data"
npx tsx seed/run.ts

# Rebuild the client only when its inputs changed since the last build.
CLIENT_HASH="$(cat package-lock.json index.html vite.config.ts tailwind.config.ts 2>/dev/null | cat - <(find src shared -type f -print0 | sort -z | xargs -0 cat) | sha1sum | cut -c1-40)"
if [ ! -f dist/index.html ] || [ "$(cat "$DATA_DIR/client-build-hash" 2>/dev/null)" != "$CLIENT_HASH" ]; then
  log "building the client"
  npx vite build --logLevel warn
  echo "$CLIENT_HASH" >"$DATA_DIR/client-build-hash"
fi

export STATIC_DIR="$ROOT/dist"
log "serving Arcwise on http://localhost:${PORT:-3000} (Ctrl-C stops it)"
# node itself, not an npx wrapper: the TERM sent on stop must reach the server so that it drains.
node --import tsx server/index.ts &
SERVER_PID=$!
wait "$SERVER_PID"
