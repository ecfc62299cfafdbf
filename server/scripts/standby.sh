#!/usr/bin/env bash
# A throwaway streaming standby of a PostgreSQL server on loopback: the replica test starts one
# with it, and it serves to try DATABASE_REPLICA_URLS by hand.
#   standby.sh start PRIMARY_URL PORT DIR   pg_basebackup -R from the primary into DIR, start it on PORT
#   standby.sh stop DIR                     stop it and delete DIR
# The primary's user needs the REPLICATION right (the project's cluster user is its superuser) and
# a `host replication` line in pg_hba.conf (initdb writes one for 127.0.0.1).
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

start_standby() {
  local primary_url="$1" port="$2" dir="$3"
  ensure_postgres_installed
  mkdir -p "$dir/run"
  # As root the server runs as `postgres`, which must own everything it writes.
  if is_root; then chown -R postgres:postgres "$dir"; fi
  # A hot standby refuses to start with fewer connection slots than its primary has.
  local max_connections
  max_connections="$(psql "$primary_url" -qtAc 'SHOW max_connections')"
  pg_run "$PG_BIN/pg_basebackup" -d "$primary_url" -D "$dir/data" -R -X stream --checkpoint=fast >/dev/null
  pg_run touch "$dir/postgres.log"
  pg_run "$PG_BIN/pg_ctl" -D "$dir/data" -l "$dir/postgres.log" -w -t 60 \
    -o "-h 127.0.0.1 -p $port -k $dir/run -c max_connections=$max_connections -c fsync=off -c hot_standby=on" start >/dev/null
}

stop_standby() {
  local dir="$1"
  PG_BIN="$(pg_bin_dir)"
  if [ -f "$dir/data/PG_VERSION" ]; then pg_run "$PG_BIN/pg_ctl" -D "$dir/data" -m immediate -w stop >/dev/null 2>&1 || true; fi
  rm -rf "$dir"
}

case "${1:-}" in
  start) start_standby "$2" "$3" "$4" ;;
  stop) stop_standby "$2" ;;
  *) echo "usage: $0 start PRIMARY_URL PORT DIR | stop DIR" >&2; exit 2 ;;
esac
