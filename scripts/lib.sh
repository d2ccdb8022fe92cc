#!/usr/bin/env bash
# Shared helpers for start.sh, test.sh and bench.sh. Every step is idempotent so a
# fresh Debian machine (as root, nothing running) and a warm developer machine take
# the same path.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="${DATA_DIR:-$ROOT/.data}"
export DB_HOST="${DB_HOST:-127.0.0.1}"
export DB_PORT="${DB_PORT:-3307}"
export DB_USER="${DB_USER:-specbench}"
export DB_PASSWORD="${DB_PASSWORD:-specbench-local}"
# The benchmarks' own account: it alone may bulk-load files (FILE), and only from $BULK_DIR.
export BENCH_DB_USER="${BENCH_DB_USER:-specbench_bench}"
export BENCH_DB_PASSWORD="${BENCH_DB_PASSWORD:-specbench-bench-local}"
mkdir -p "$DATA_DIR"
export BULK_DIR="$DATA_DIR/bulk-load"

# Unix socket paths are limited to ~107 bytes; a deep clone falls back to /tmp.
DB_SOCKET="$DATA_DIR/mysqld.sock"
if [ "${#DB_SOCKET}" -gt 90 ]; then
  DB_SOCKET="/tmp/specbench-$(printf '%s' "$DATA_DIR" | sha1sum | cut -c1-10).sock"
fi
DB_PID_FILE="$DATA_DIR/mysqld.pid"

log() { printf '\033[1m[specbench]\033[0m %s\n' "$*"; }

apt_updated=0
ensure_apt() { # ensure_apt <binary> <package>
  command -v "$1" >/dev/null 2>&1 && return 0
  log "installing Debian package $2"
  if [ "$(id -u)" -ne 0 ]; then echo "need root to apt-get install $2" >&2; return 1; fi
  if [ "$apt_updated" -eq 0 ]; then apt-get update -q >/dev/null; apt_updated=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -q "$2" >/dev/null
}

ensure_npm() {
  cd "$ROOT"
  local stamp="node_modules/.package-lock.json"
  if [ ! -f "$stamp" ] || [ package-lock.json -nt "$stamp" ]; then
    log "installing npm packages (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

db_admin() { mariadb-admin --no-defaults --protocol=socket -S "$DB_SOCKET" -u "$(id -un)" "$@"; }
db_sql() { mariadb --no-defaults --protocol=socket -S "$DB_SOCKET" -u "$(id -un)" -e "$1"; }
db_is_up() { db_admin ping >/dev/null 2>&1; }

# Starts the project's own MariaDB (never the system service) unless it already runs.
# Sets DB_STARTED_HERE=1 when this call started it.
DB_STARTED_HERE=0
db_start() {
  ensure_apt mariadbd mariadb-server
  if db_is_up; then db_grant; return 0; fi
  if [ ! -d "$DATA_DIR/db/mysql" ]; then
    log "initialising MariaDB data directory in $DATA_DIR/db"
    mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$DATA_DIR/db" \
      --auth-root-authentication-method=socket --skip-test-db --skip-name-resolve >/dev/null
  fi
  # A pid file left by a crash would block the start.
  if [ -f "$DB_PID_FILE" ] && ! kill -0 "$(cat "$DB_PID_FILE")" 2>/dev/null; then rm -f "$DB_PID_FILE"; fi
  log "starting MariaDB on $DB_HOST:$DB_PORT"
  mkdir -p "$BULK_DIR"
  # No LOAD DATA LOCAL for anyone; server-side LOAD DATA only from $BULK_DIR (and only with FILE).
  setsid mariadbd --no-defaults --user="$(id -un)" --datadir="$DATA_DIR/db" \
    --bind-address=127.0.0.1 --port="$DB_PORT" --socket="$DB_SOCKET" --pid-file="$DB_PID_FILE" \
    --log-error="$DATA_DIR/mysqld.log" --skip-name-resolve --local-infile=0 --secure-file-priv="$BULK_DIR" \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --max-connections=300 --innodb-buffer-pool-size=256M </dev/null >/dev/null 2>&1 &
  for _ in $(seq 1 150); do
    if db_is_up; then DB_STARTED_HERE=1; db_grant; return 0; fi
    sleep 0.2
  done
  echo "MariaDB did not start; see $DATA_DIR/mysqld.log" >&2
  tail -20 "$DATA_DIR/mysqld.log" >&2 || true
  return 1
}

# The app connects over TCP with a password; it may create any database named specbench*, and
# holds no global privilege (no FILE). The benchmarks' account adds FILE for MariaDB's own bulk
# load, confined to $BULK_DIR by --secure-file-priv. Idempotent: run on every start.
db_grant() {
  db_sql "CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
          ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
          GRANT ALL PRIVILEGES ON \`specbench%\`.* TO '$DB_USER'@'127.0.0.1';
          REVOKE FILE ON *.* FROM '$DB_USER'@'127.0.0.1';
          CREATE USER IF NOT EXISTS '$BENCH_DB_USER'@'127.0.0.1' IDENTIFIED BY '$BENCH_DB_PASSWORD';
          ALTER USER '$BENCH_DB_USER'@'127.0.0.1' IDENTIFIED BY '$BENCH_DB_PASSWORD';
          GRANT ALL PRIVILEGES ON \`specbench\\_bench%\`.* TO '$BENCH_DB_USER'@'127.0.0.1';
          GRANT FILE ON *.* TO '$BENCH_DB_USER'@'127.0.0.1';"
}

db_stop() {
  [ -f "$DB_PID_FILE" ] || return 0
  local pid; pid="$(cat "$DB_PID_FILE")"
  log "stopping MariaDB"
  kill -TERM "$pid" 2>/dev/null || true
  for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || return 0; sleep 0.1; done
}

build_server() {
  cd "$ROOT"
  log "compiling the server"
  rm -rf dist-server
  npx tsc -p server/tsconfig.json
  npx tsc-alias -p server/tsconfig.json
}

# Rebuilds the web app only when its sources changed since the last build.
build_web() {
  cd "$ROOT"
  local hash
  hash="$( { find app components lib assets data -type f -print0 2>/dev/null || true; } | sort -z | xargs -0 -r sha1sum | \
    cat - app.json babel.config.js metro.config.js scripts/build-web.js scripts/web-fonts.js package-lock.json | sha1sum | cut -c1-40)"
  if [ -f dist/index.html ] && [ "$(cat "$DATA_DIR/web-build.hash" 2>/dev/null)" = "$hash" ]; then
    log "web build is up to date"
    return 0
  fi
  log "building the web app (expo export)"
  CI=1 npx expo export --platform web --output-dir dist >"$DATA_DIR/web-build.log" 2>&1 || {
    tail -40 "$DATA_DIR/web-build.log" >&2; return 1; }
  # Manifest, Workbox service worker and the .br/.gz twins the server sends.
  node scripts/build-web.js dist >>"$DATA_DIR/web-build.log" 2>&1 || { tail -20 "$DATA_DIR/web-build.log" >&2; return 1; }
  echo "$hash" >"$DATA_DIR/web-build.hash"
}
