#!/usr/bin/env bash
# npm run bench: prints the performance figures of DESIGN §8 that are measured so far.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_npm
cd "$ROOT"
npx tsx --tsconfig server/tsconfig.json scripts/bench-search.ts
