#!/usr/bin/env bash
# Start (or stop) a throwaway PostgreSQL cluster listening on 127.0.0.1 only, for the PostgreSQL test pass.
# Usage: scripts/pg-server.sh start DIR PORT | scripts/pg-server.sh stop DIR
set -euo pipefail
cmd=$1 dir=$2 port=${3:-54329}
pgbin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
[ -n "$pgbin" ] || { echo "PostgreSQL is not installed (apt-get install -y postgresql)" >&2; exit 1; }
as_pg() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }
case $cmd in
  start)
    mkdir -p "$dir"
    [ "$(id -u)" = 0 ] && chown postgres:postgres "$dir"
    as_pg "$pgbin/initdb" -D "$dir/data" -U postgres --auth=trust -E UTF8 >/dev/null
    as_pg "$pgbin/pg_ctl" -D "$dir/data" -l "$dir/log" -w -o "-c listen_addresses=127.0.0.1 -p $port -k $dir -c fsync=off -c max_connections=200" start >/dev/null
    echo "postgres://postgres@127.0.0.1:$port/postgres"
    ;;
  stop)
    as_pg "$pgbin/pg_ctl" -D "$dir/data" -m fast stop >/dev/null 2>&1 || true
    ;;
esac
