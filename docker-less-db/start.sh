#!/usr/bin/env bash
# Initialises (once) and starts the project-local PostgreSQL on $TALLUS_DB_HOST:$TALLUS_DB_PORT,
# with its unix socket inside the data folder, then makes sure the role and database exist.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
bash "$(dirname "${BASH_SOURCE[0]}")/install.sh"
find_pg_bin

if [ "$(id -u)" = "0" ] && ! id "$TALLUS_DB_OS_USER" >/dev/null 2>&1; then
  useradd --system --no-create-home --shell /usr/sbin/nologin "$TALLUS_DB_OS_USER"
fi

mkdir -p "$TALLUS_DB_DATA"
if [ "$(id -u)" = "0" ]; then
  chown "$TALLUS_DB_OS_USER" "$TALLUS_DB_DATA"
  # The server user must be able to traverse every parent folder of the data folder.
  dir="$(dirname "$TALLUS_DB_DATA")"
  while [ "$dir" != "/" ]; do chmod o+x "$dir" 2>/dev/null || true; dir="$(dirname "$dir")"; done
fi
chmod 700 "$TALLUS_DB_DATA"

if [ ! -f "$TALLUS_DB_DATA/PG_VERSION" ]; then
  pwfile="$(mktemp)"; printf '%s\n' "$TALLUS_DB_PASSWORD" > "$pwfile"
  [ "$(id -u)" = "0" ] && chown "$TALLUS_DB_OS_USER" "$pwfile"
  as_db_user "$PG_BIN/initdb" -D "$TALLUS_DB_DATA" -U "$TALLUS_DB_USER" --pwfile="$pwfile" \
    --auth-local=scram-sha-256 --auth-host=scram-sha-256 -E UTF8 --locale=C.UTF-8 >/dev/null
  rm -f "$pwfile"
fi

if as_db_user "$PG_BIN/pg_ctl" -D "$TALLUS_DB_DATA" status >/dev/null 2>&1; then
  echo "PostgreSQL already running on $TALLUS_DB_HOST:$TALLUS_DB_PORT"
else
  opts="-c listen_addresses=$TALLUS_DB_HOST -p $TALLUS_DB_PORT -k $TALLUS_DB_DATA"
  if [ "$TALLUS_DB_MODE" = "throwaway" ]; then opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"; fi
  as_db_user "$PG_BIN/pg_ctl" -D "$TALLUS_DB_DATA" -l "$TALLUS_DB_DATA/server.log" -o "$opts" -w -t 60 start >/dev/null
  echo "PostgreSQL started on $TALLUS_DB_HOST:$TALLUS_DB_PORT (data in $TALLUS_DB_DATA)"
fi

export PGPASSWORD="$TALLUS_DB_PASSWORD"
psql_cmd=("$PG_BIN/psql" -h "$TALLUS_DB_HOST" -p "$TALLUS_DB_PORT" -U "$TALLUS_DB_USER" -d postgres -v ON_ERROR_STOP=1 -qtA)
if [ -z "$("${psql_cmd[@]}" -c "SELECT 1 FROM pg_database WHERE datname = '$TALLUS_DB_NAME'")" ]; then
  "${psql_cmd[@]}" -c "CREATE DATABASE \"$TALLUS_DB_NAME\"" >/dev/null
  echo "Created database $TALLUS_DB_NAME"
fi
