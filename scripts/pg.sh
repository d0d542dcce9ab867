#!/usr/bin/env bash
# A private PostgreSQL cluster for Nightloom on 127.0.0.1:$PG_PORT with its data in .data/pg.
# Sourced after lib.sh. The server refuses to run as root, so the cluster belongs to `postgres`.
PG_USER_OS=postgres
PG_SOCKET_DIR="/tmp/nightloom-pg-$PG_PORT"   # short: socket paths over 107 bytes fail

pg_data_dir() {
  local preferred="$DATA_DIR/pg"
  if [ -f "$DATA_DIR/pg-location" ]; then cat "$DATA_DIR/pg-location"; return; fi
  mkdir -p "$DATA_DIR"
  install -d -m 700 -o "$PG_USER_OS" "$preferred" 2>/dev/null || true
  if runuser -u "$PG_USER_OS" -- test -w "$preferred" 2>/dev/null; then
    echo "$preferred" > "$DATA_DIR/pg-location"
  else
    # The checkout is not reachable by the postgres user (e.g. under a 0700 home).
    local fallback="/var/tmp/nightloom-pg-$(printf '%s' "$ROOT" | md5sum | cut -c1-8)"
    install -d -m 700 -o "$PG_USER_OS" "$fallback"
    echo "$fallback" > "$DATA_DIR/pg-location"
  fi
  cat "$DATA_DIR/pg-location"
}

pg_run() { runuser -u "$PG_USER_OS" -- "$@"; }

pg_psql() { pg_run "$PG_BIN/psql" -X -q -v ON_ERROR_STOP=1 -h "$PG_SOCKET_DIR" -p "$PG_PORT" -U postgres "$@"; }

pg_is_ready() { "$PG_BIN/pg_isready" -q -h 127.0.0.1 -p "$PG_PORT" >/dev/null 2>&1; }

# Starts the cluster unless it already runs. Sets PG_STARTED_BY_US=1 when this call started it.
pg_start() {
  PG_BIN="$(pg_bin_dir)"
  PG_DATA="$(pg_data_dir)"
  PG_STARTED_BY_US=0
  install -d -m 700 -o "$PG_USER_OS" "$PG_SOCKET_DIR"
  if [ ! -f "$PG_DATA/PG_VERSION" ]; then
    log "creating the database cluster in $PG_DATA"
    pg_run "$PG_BIN/initdb" -D "$PG_DATA" -U postgres --auth-local=trust --auth-host=scram-sha-256 \
      -E UTF8 --locale=C.UTF-8 --no-sync >/dev/null
    cat >> "$PG_DATA/postgresql.conf" <<CONF
listen_addresses = '127.0.0.1'
unix_socket_directories = '$PG_SOCKET_DIR'
timezone = 'UTC'
log_timezone = 'UTC'
fsync = on
max_connections = 100
CONF
  fi
  if pg_is_ready; then return; fi
  # A kill -9 leaves postmaster.pid behind: clear it only when its PID is not a live postgres.
  if [ -f "$PG_DATA/postmaster.pid" ]; then
    local pid; pid=$(head -n 1 "$PG_DATA/postmaster.pid")
    if ! grep -qs postgres "/proc/$pid/comm"; then rm -f "$PG_DATA/postmaster.pid"; fi
  fi
  pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" -o "-p $PG_PORT -k $PG_SOCKET_DIR" -l "$PG_DATA/server.log" -w -t 30 start >/dev/null \
    || { tail -n 20 "$PG_DATA/server.log" >&2; die "PostgreSQL did not start"; }
  PG_STARTED_BY_US=1
}

pg_stop() {
  [ -n "${PG_DATA:-}" ] || return 0
  pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" -m fast -w stop >/dev/null 2>&1 || true
}

# Creates (or keeps) a login role and a database owned by it. Args: role password database.
pg_ensure_database() {
  local role="$1" password="$2" db="$3"
  pg_psql -d postgres <<SQL
DO \$\$ BEGIN
  IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = '$role') THEN
    CREATE ROLE "$role" LOGIN PASSWORD '$password';
  END IF;
END \$\$;
SQL
  if [ "$(pg_psql -d postgres -tA -c "SELECT 1 FROM pg_database WHERE datname = '$db'")" != "1" ]; then
    pg_psql -d postgres -c "CREATE DATABASE \"$db\" OWNER \"$role\""
  fi
}

pg_drop_database() { pg_psql -d postgres -c "DROP DATABASE IF EXISTS \"$1\" WITH (FORCE)"; }
