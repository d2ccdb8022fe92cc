#!/usr/bin/env bash
# Generates a TypeORM migration for the entity changes not yet covered by migrations:
#   bash scripts/generate-migration.sh CorrectionQueue
# It migrates a throwaway database to the current migrations, diffs the entities against
# it, names the file <timestamp>-<kebab-name>.ts and drops the datetime(3) default noise
# TypeORM reports on every run. Review the file before committing it.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
name="${1:?usage: generate-migration.sh PascalCaseName}"
db_start >/dev/null
cd "$ROOT"
rm -rf dist-server && npm run -s build:server
db_sql "DROP DATABASE IF EXISTS specbench_migrate; CREATE DATABASE specbench_migrate CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
export DB_NAME=specbench_migrate
npx typeorm migration:run -d dist-server/server/db/data-source.js >/dev/null
npx typeorm migration:generate -d dist-server/server/db/data-source.js "server/db/migrations/$name" | tail -1
db_sql "DROP DATABASE specbench_migrate;"
file="$(ls server/db/migrations/*-"$name".ts)"
kebab="$(printf '%s' "$name" | sed -E 's/([a-z0-9])([A-Z])/\1-\2/g' | tr '[:upper:]' '[:lower:]')"
sed -i '/CHANGE \\`created_at\\`\|CHANGE \\`updated_at\\`/d' "$file"
mv "$file" "${file%-"$name".ts}-$kebab.ts"
echo "wrote ${file%-"$name".ts}-$kebab.ts"
