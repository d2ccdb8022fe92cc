#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB, migrate, load the demo library,
# build the web app when its sources changed, and serve everything on $PORT.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
export PORT="${PORT:-8080}"
export DB_NAME="${DB_NAME:-specbench}"

# One running instance per data folder: a second start says so and leaves it alone.
exec 9>"$DATA_DIR/start.lock"
if ! flock -n 9; then
  echo "Specbench is already running from $ROOT (lock $DATA_DIR/start.lock). Stop it with Ctrl-C first." >&2
  exit 1
fi

ensure_npm
db_start
build_server
build_web

server_pid=""
shutdown() {
  trap - INT TERM EXIT
  if [ -n "$server_pid" ]; then kill -TERM "$server_pid" 2>/dev/null || true; wait "$server_pid" 2>/dev/null || true; fi
  db_stop
  exit 0
}
trap shutdown INT TERM EXIT

cd "$ROOT"
node dist-server/server/cli/setup.js
node dist-server/server/index.js &
server_pid=$!
wait "$server_pid"
