#!/usr/bin/env bash
# The project's own MariaDB: `db.sh start` (idempotent; prints "started" when this
# call started it), `db.sh stop`, `db.sh status`.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
case "${1:-status}" in
  start) db_start >&2; [ "$DB_STARTED_HERE" = 1 ] && echo started || echo running ;;
  stop) db_stop ;;
  status) if db_is_up; then echo up; else echo down; exit 1; fi ;;
  *) echo "usage: db.sh start|stop|status" >&2; exit 2 ;;
esac
