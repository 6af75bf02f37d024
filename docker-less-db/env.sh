# Shared settings of the project-local PostgreSQL. Every value can be overridden from the environment.
# Sourced by start.sh, stop.sh and status.sh; not meant to be run on its own.
TALLUS_ROOT="${TALLUS_ROOT:-$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)}"
# Folder of the cluster (git-ignored). The unix socket lives inside it, so nothing else on the machine sees it.
TALLUS_DB_DATA="${TALLUS_DB_DATA:-$TALLUS_ROOT/.pgdata}"
TALLUS_DB_HOST="${TALLUS_DB_HOST:-127.0.0.1}"
TALLUS_DB_PORT="${TALLUS_DB_PORT:-54320}"
TALLUS_DB_NAME="${TALLUS_DB_NAME:-tallus}"
TALLUS_DB_USER="${TALLUS_DB_USER:-tallus}"
TALLUS_DB_PASSWORD="${TALLUS_DB_PASSWORD:-tallus-local-only}"
# The unprivileged system user that owns and runs the cluster (initdb and postgres refuse root).
TALLUS_DB_OS_USER="${TALLUS_DB_OS_USER:-postgres}"
# "throwaway" turns off fsync for test clusters; never use it for data you keep.
TALLUS_DB_MODE="${TALLUS_DB_MODE:-durable}"

find_pg_bin() {
  local dir
  for dir in /usr/lib/postgresql/*/bin; do
    [ -x "$dir/initdb" ] && PG_BIN="$dir"
  done
  [ -n "${PG_BIN:-}" ]
}

# Runs a command as the cluster's system user when we are root, directly otherwise.
as_db_user() {
  if [ "$(id -u)" = "0" ]; then runuser -u "$TALLUS_DB_OS_USER" -- "$@"; else "$@"; fi
}
