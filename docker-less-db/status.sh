#!/usr/bin/env bash
# Says whether the project-local PostgreSQL runs, where, and whether it accepts connections.
set -uo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
find_pg_bin || { echo "PostgreSQL is not installed (npm start installs it)."; exit 1; }
if [ ! -f "$TALLUS_DB_DATA/PG_VERSION" ]; then echo "No cluster in $TALLUS_DB_DATA yet (npm start creates it)."; exit 1; fi
if as_db_user "$PG_BIN/pg_ctl" -D "$TALLUS_DB_DATA" status >/dev/null 2>&1; then
  "$PG_BIN/pg_isready" -h "$TALLUS_DB_HOST" -p "$TALLUS_DB_PORT" -q && state="accepting connections" || state="starting"
  echo "PostgreSQL running on $TALLUS_DB_HOST:$TALLUS_DB_PORT, $state; data in $TALLUS_DB_DATA"
else
  echo "PostgreSQL stopped; data in $TALLUS_DB_DATA"; exit 3
fi
