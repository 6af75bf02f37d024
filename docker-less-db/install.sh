#!/usr/bin/env bash
# Installs PostgreSQL from Debian's packages when no server binaries are present. Idempotent.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"
if find_pg_bin; then exit 0; fi
if [ "$(id -u)" != "0" ]; then
  echo "PostgreSQL is not installed and this user cannot install it: run 'apt-get install postgresql' as root." >&2
  exit 1
fi
echo "Installing PostgreSQL from Debian's packages..."
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq --no-install-recommends postgresql >/dev/null
# Debian's package starts a cluster of its own on port 5432; Tallus does not use it.
if command -v pg_lsclusters >/dev/null; then
  pg_lsclusters -h 2>/dev/null | while read -r ver name _; do pg_ctlcluster "$ver" "$name" stop 2>/dev/null || true; done
fi
find_pg_bin || { echo "PostgreSQL installation failed: no initdb found." >&2; exit 1; }
