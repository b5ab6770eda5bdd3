#!/usr/bin/env bash
# A throwaway PostgreSQL cluster for the tests: started in a temporary folder on a free loopback port, with trust
# authentication and no fsync (DECIDE_PG_FSYNC=on for measurements), and removed afterwards. Sourced by test.sh. When DECIDE_TEST_POSTGRES is already set
# (a server of your own), nothing is started and that server is used.

pg_dir=""

start_test_postgres() {
  if [ -n "${DECIDE_TEST_POSTGRES:-}" ]; then
    echo "Testing against the PostgreSQL server given in DECIDE_TEST_POSTGRES."
    return 0
  fi
  local bin port
  bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
  [ -x "$bin/initdb" ] || { echo "PostgreSQL is not installed (no initdb under /usr/lib/postgresql)."; return 1; }
  port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1]); s.close()' 2>/dev/null || echo 55432)
  pg_dir=$(mktemp -d /tmp/decide-pg.XXXXXX)
  chmod 755 "$pg_dir"
  local as=()
  if [ "$(id -u)" -eq 0 ]; then
    chown postgres "$pg_dir"
    as=(su postgres -s /bin/sh -c)
  else
    as=(sh -c)
  fi
  "${as[@]}" "$bin/initdb -D $pg_dir/data -U postgres -A trust --no-sync >$pg_dir/initdb.log 2>&1" \
    || { echo "initdb failed:"; cat "$pg_dir/initdb.log"; return 1; }
  "${as[@]}" "$bin/pg_ctl -D $pg_dir/data -l $pg_dir/log -w start -o '-p $port -k $pg_dir -c listen_addresses=127.0.0.1 -c fsync=${DECIDE_PG_FSYNC:-off} -c max_connections=300'" >/dev/null \
    || { echo "PostgreSQL did not start:"; cat "$pg_dir/log"; return 1; }
  pg_bin="$bin"
  export DECIDE_TEST_POSTGRES="Host=127.0.0.1;Port=$port;Username=postgres;Pooling=true;Maximum Pool Size=40"
  echo "Started a throwaway PostgreSQL on 127.0.0.1:$port."
}

stop_test_postgres() {
  [ -n "$pg_dir" ] || return 0
  if [ "$(id -u)" -eq 0 ]; then
    su postgres -s /bin/sh -c "$pg_bin/pg_ctl -D $pg_dir/data -w -m fast stop" >/dev/null 2>&1
  else
    "$pg_bin/pg_ctl" -D "$pg_dir/data" -w -m fast stop >/dev/null 2>&1
  fi
  rm -rf "$pg_dir"
  pg_dir=""
  unset DECIDE_TEST_POSTGRES
}
