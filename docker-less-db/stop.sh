#!/usr/bin/env bash
# Stops the project-local PostgreSQL cleanly (fast shutdown: open sessions are ended, data is kept).
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
find_pg_bin || { echo "PostgreSQL is not installed."; exit 0; }
if [ -f "$TALLUS_DB_DATA/postmaster.pid" ]; then
  as_db_user "$PG_BIN/pg_ctl" -D "$TALLUS_DB_DATA" -m fast -w -t 60 stop >/dev/null && echo "PostgreSQL stopped"
else
  echo "PostgreSQL is not running"
fi
