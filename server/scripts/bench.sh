#!/usr/bin/env bash
# `npm run bench`: the benchmark figures, on a database of their own with the scale data set.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
trap stop_postgres_if_ours EXIT
ensure_node_modules
if [ -z "${BENCH_DATABASE_URL:-}" ]; then
  start_postgres
  ensure_database arcwise_bench
  export BENCH_DATABASE_URL="$(local_database_url arcwise_bench)"
fi
export DATABASE_URL="$BENCH_DATABASE_URL"
export TSX_TSCONFIG_PATH="$ROOT/tsconfig.json"
npx tsx tests/bench/run.ts
npx tsx tests/bench/bundle-size.ts
