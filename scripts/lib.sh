#!/usr/bin/env bash
# Shared bootstrap steps for `npm start` and `npm test`. Sourced, not run.
# Everything here is idempotent: a second run reuses what the first one set up.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="$ROOT/.data"
PG_PORT="${NIGHTLOOM_PG_PORT:-54329}"
export PATH="$ROOT/node_modules/.bin:$PATH"
export EXPO_NO_TELEMETRY=1

log() { printf '\033[1;33m[nightloom]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[nightloom]\033[0m %s\n' "$*" >&2; exit 1; }

as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else die "need root for: $*"; fi
}

APT_UPDATED=0
apt_install() {
  command -v apt-get >/dev/null || die "apt-get not found: install $* by hand"
  if [ "$APT_UPDATED" -eq 0 ]; then as_root apt-get update -q >/dev/null; APT_UPDATED=1; fi
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends "$@" >/dev/null
}

# npm packages from the lock file, only when the lock changed since the last install.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.nightloom-lock"
  if [ -f "$stamp" ] && cmp -s "$ROOT/package-lock.json" "$stamp"; then return; fi
  log "installing npm packages (npm ci)"
  (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  cp "$ROOT/package-lock.json" "$stamp"
}

pg_bin_dir() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [ -n "$d" ] && [ -x "$d/initdb" ] && echo "$d"
}

ensure_postgres_installed() {
  if pg_bin_dir >/dev/null; then return; fi
  log "installing PostgreSQL from Debian's packages"
  # No system cluster: Nightloom runs its own, inside .data/.
  as_root mkdir -p /etc/postgresql-common/createcluster.d
  echo "create_main_cluster = false" | as_root tee /etc/postgresql-common/createcluster.d/nightloom.conf >/dev/null
  apt_install postgresql
  pg_bin_dir >/dev/null || die "PostgreSQL install did not provide initdb"
}

ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return; fi
  log "installing Chromium from Debian's packages"
  apt_install chromium fonts-liberation
}

# A random secret kept in .data so sessions survive restarts.
ensure_auth_secret() {
  mkdir -p "$DATA_DIR"
  if [ ! -s "$DATA_DIR/auth-secret" ]; then
    node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))" > "$DATA_DIR/auth-secret"
    chmod 600 "$DATA_DIR/auth-secret"
  fi
  export BETTER_AUTH_SECRET="${BETTER_AUTH_SECRET:-$(cat "$DATA_DIR/auth-secret")}"
}

WEB_SOURCES=(app components hooks constants lib shared assets app.json package-lock.json tsconfig.json patches)

# Builds the web export into dist/ unless it is newer than every client source file.
ensure_web_build() {
  local stamp="$ROOT/dist/.nightloom-build" srcs=()
  for s in "${WEB_SOURCES[@]}"; do [ -e "$ROOT/$s" ] && srcs+=("$ROOT/$s"); done
  if [ -f "$stamp" ] && [ -z "$(find "${srcs[@]}" -newer "$stamp" -type f -print -quit)" ]; then
    log "web build is up to date"
    return
  fi
  log "building the web app (expo export)"
  local t0=$SECONDS
  (cd "$ROOT" && rm -rf dist && npx expo export --platform web --output-dir dist >"$DATA_DIR/web-build.log" 2>&1) \
    || { tail -n 40 "$DATA_DIR/web-build.log" >&2; die "web build failed (log: .data/web-build.log)"; }
  touch "$stamp"
  log "web build done in $((SECONDS - t0)) s"
}
