#!/usr/bin/env bash
# Throwaway PostgreSQL cluster for the server-mode tests: a temp folder owned by postgres, a free
# loopback port, a private socket folder. Source this file, then `start_test_postgres`; it exports
# KERFWISE_TEST_DATABASE_URL and sets a trap that stops the cluster and removes the folder on exit.
PG_BIN="${PG_BIN:-$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)}"

install_postgres_if_missing() {
  if [ -z "$PG_BIN" ] || [ ! -x "$PG_BIN/initdb" ]; then
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq
    apt-get install -y -qq postgresql >/dev/null
    PG_BIN="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)"
  fi
}

free_port() {
  node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"
}

# PostgreSQL refuses to run as root, so the cluster runs as postgres (as is when not root).
as_pg() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

stop_test_postgres() {
  if [ -n "${PG_TEST_DIR:-}" ] && [ -d "$PG_TEST_DIR/data" ]; then
    as_pg "$PG_BIN/pg_ctl" -D "$PG_TEST_DIR/data" stop -m fast >/dev/null 2>&1 || true
    rm -rf "$PG_TEST_DIR"
  fi
}

start_test_postgres() {
  install_postgres_if_missing
  PG_TEST_DIR="$(mktemp -d /tmp/kerfwise-pg.XXXXXX)"
  local port="${PG_TEST_PORT:-$(free_port)}"
  if [ "$(id -u)" = 0 ]; then chown postgres:postgres "$PG_TEST_DIR"; fi
  trap stop_test_postgres EXIT
  as_pg "$PG_BIN/initdb" -D "$PG_TEST_DIR/data" -U kerfwise --auth=trust -E UTF8 >/dev/null
  as_pg "$PG_BIN/pg_ctl" -D "$PG_TEST_DIR/data" -l "$PG_TEST_DIR/log" -w \
    -o "-p $port -k $PG_TEST_DIR -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200" start >/dev/null
  export KERFWISE_TEST_DATABASE_URL="postgres://kerfwise@127.0.0.1:$port/postgres"
  echo "Test PostgreSQL at $KERFWISE_TEST_DATABASE_URL (folder $PG_TEST_DIR)"
}
