#!/usr/bin/env bash
# Starts or stops a throwaway PostgreSQL server on loopback for the DATABASE_URL suite.
#   .ci/pg-server.sh start <dir> <port>   prints the admin URL
#   .ci/pg-server.sh stop <dir>
set -euo pipefail
cmd=$1 dir=$2 port=${3:-55432}
bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)
[ -n "$bin" ] || { echo "PostgreSQL server binaries not found (apt-get install -y postgresql)" >&2; exit 1; }
as_pg() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }
case "$cmd" in
  start)
    rm -rf "$dir"; mkdir -p "$dir"; [ "$(id -u)" = 0 ] && chown postgres "$dir"
    as_pg "$bin/initdb" -D "$dir/data" -U postgres -A trust >/dev/null
    as_pg "$bin/pg_ctl" -D "$dir/data" -o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c fsync=off" -l "$dir/log" -w start >/dev/null
    echo "postgres://postgres@127.0.0.1:$port/postgres"
    ;;
  stop)
    as_pg "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null || true
    ;;
esac
