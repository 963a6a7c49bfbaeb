#!/usr/bin/env bash
# Starts a throw-away PostgreSQL server for the lab-server tests and prints its JDBC URL.
#   postgres-throwaway.sh start <folder> <port>   -> prints jdbc:postgresql://127.0.0.1:<port>/tracegas
#   postgres-throwaway.sh stop <folder>
# Uses the machine's PostgreSQL binaries (Debian package postgresql); as root, runs them as user postgres.
set -euo pipefail
cmd=$1; dir=$2
bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)
[ -n "$bin" ] || { echo "postgres-throwaway: no PostgreSQL server binaries under /usr/lib/postgresql" >&2; exit 1; }
as_owner() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }
case $cmd in
  start)
    port=$3
    mkdir -p "$dir"
    [ "$(id -u)" = 0 ] && chown postgres "$dir"
    as_owner "$bin/initdb" -D "$dir/data" -A trust -U postgres --no-sync >"$dir/initdb.log" 2>&1 \
      || { cat "$dir/initdb.log" >&2; exit 1; }
    as_owner "$bin/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w \
      -o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200" start >/dev/null \
      || { cat "$dir/server.log" >&2; exit 1; }
    as_owner "$bin/psql" -q -h 127.0.0.1 -p "$port" -U postgres -d postgres \
      -c "CREATE ROLE tracegas LOGIN PASSWORD 'tracegas' CREATEDB" -c "CREATE DATABASE tracegas OWNER tracegas" >/dev/null
    echo "jdbc:postgresql://127.0.0.1:$port/tracegas"
    ;;
  stop)
    [ -d "$dir/data" ] && as_owner "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
    rm -rf "$dir"
    ;;
  *) echo "usage: postgres-throwaway.sh start <folder> <port> | stop <folder>" >&2; exit 2 ;;
esac
