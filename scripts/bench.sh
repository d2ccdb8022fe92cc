#!/usr/bin/env bash
# npm run bench: prints the performance figures of DESIGN §8 that are measured so far.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_npm
cd "$ROOT"
# The in-process benchmarks (search, import) run the compiled server code that npm start runs:
# tsx's on-the-fly build keeps every function's name with a helper call per closure created,
# which costs the import's validation about twice its time.
build_server

# Search at 1 000 000 invented specs (issue 14): the library is loaded once into
# specbench_bench_search (several minutes; building its FULLTEXT anchor index takes longer than
# a request may, hence the longer query bound) and kept for later runs while unchanged.
db_state="$(bash "$ROOT/scripts/db.sh" start)"
search_status=0
DB_QUERY_TIMEOUT_MS=600000 DB_NAME=specbench_bench_search node dist-server/scripts/bench-search.js || search_status=$?
if [ "$db_state" = started ]; then bash "$ROOT/scripts/db.sh" stop; fi
[ "$search_status" -eq 0 ] || exit "$search_status"

# CSV import: 50 000 invented rows validated, previewed and committed, against MariaDB's own
# bulk load of the same file, in the throwaway database specbench_bench (created, migrated
# and dropped by the script). MariaDB is started when it is not running, and stopped again.
db_state="$(bash "$ROOT/scripts/db.sh" start)"
import_status=0
DB_NAME=specbench_bench DB_USER="$BENCH_DB_USER" DB_PASSWORD="$BENCH_DB_PASSWORD" node dist-server/scripts/bench-import.js || import_status=$?
if [ "$db_state" = started ]; then bash "$ROOT/scripts/db.sh" stop; fi
[ "$import_status" -eq 0 ] || exit "$import_status"

# API and web: a server process of its own (so the load generator does not share its event
# loop) on a throwaway database with the demo library, then spec reads under load and the
# first screen in Chromium.
db_state="$(bash "$ROOT/scripts/db.sh" start)"
build_web
ensure_apt chromium chromium
export DB_NAME=specbench_apibench PORT="${BENCH_PORT:-8091}" FAKE_SMTP_PORT=0 NODE_ENV=development
node dist-server/server/cli/setup.js >/dev/null
node dist-server/server/index.js >"$DATA_DIR/bench-server.log" 2>&1 &
server_pid=$!
for _ in $(seq 1 50); do curl -sf "http://127.0.0.1:$PORT/api/health" >/dev/null && break; sleep 0.2; done
bench_status=0
BENCH_URL="http://127.0.0.1:$PORT" npx tsx --tsconfig server/tsconfig.json scripts/bench-api.ts || bench_status=$?
BENCH_URL="http://127.0.0.1:$PORT" npx tsx --tsconfig server/tsconfig.json scripts/bench-plan-runs.ts || bench_status=$?
BENCH_URL="http://127.0.0.1:$PORT" npx tsx --tsconfig server/tsconfig.json scripts/bench-web.ts || bench_status=$?
BENCH_URL="http://127.0.0.1:$PORT" npx tsx --tsconfig server/tsconfig.json scripts/bench-restart.ts || bench_status=$?
kill -TERM "$server_pid" 2>/dev/null; wait "$server_pid" 2>/dev/null || true
db_sql "DROP DATABASE IF EXISTS specbench_apibench;"
if [ "$db_state" = started ]; then bash "$ROOT/scripts/db.sh" stop; fi
exit "$bench_status"
