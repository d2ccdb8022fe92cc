#!/usr/bin/env bash
# npm test: lint and type checks, then the same set-up as npm start against throwaway
# test databases, then the whole jest suite (lib, server, app, e2e). Ends with "N passed, N failed" and the
# runner's exit code.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

ensure_npm
log "lint and type checks"
(cd "$ROOT" && npm run -s lint && npm run -s typecheck)
ensure_apt chromium chromium
db_start
trap '[ "$DB_STARTED_HERE" = 1 ] && db_stop' EXIT
build_server
build_web

cd "$ROOT"
export SPECBENCH_DB_READY=1
mkdir -p .data/test-results
set +e
npx jest --ci --json --outputFile=.data/test-results/jest.json "$@"
status=$?
set -e
node scripts/summary.js .data/test-results/jest.json
exit "$status"
