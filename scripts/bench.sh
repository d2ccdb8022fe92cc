#!/usr/bin/env bash
# npm run bench: prints the performance figures of DESIGN §8 that are measured so far.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_npm
cd "$ROOT"
npx tsx --tsconfig server/tsconfig.json scripts/bench-search.ts

# CSV import: 50 000 invented rows validated, previewed and committed, against MariaDB's own
# bulk load of the same file, in the throwaway database specbench_bench (created, migrated
# and dropped by the script). MariaDB is started when it is not running, and stopped again.
db_state="$(bash "$ROOT/scripts/db.sh" start)"
import_status=0
DB_NAME=specbench_bench npx tsx --tsconfig server/tsconfig.json scripts/bench-import.ts || import_status=$?
if [ "$db_state" = started ]; then bash "$ROOT/scripts/db.sh" stop; fi
[ "$import_status" -eq 0 ] || exit "$import_status"
