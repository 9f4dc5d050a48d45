#!/usr/bin/env bash
# First step of `npm start`, `npm run dev` and `npm test`: make sure the machine has what the
# stack needs (npm packages, PostgreSQL, and for tests Chromium), then hand over to stack.ts.
set -euo pipefail
cd "$(dirname "$0")/.."
mode="${1:-start}"

as_root() { [ "$(id -u)" = 0 ]; }
apt_install() {
  # $@: Debian package names
  if as_root; then
    echo "› Installing from Debian's packages: $*"
    if [ -z "${LIFTWRIGHT_APT_UPDATED:-}" ]; then apt-get update -qq; export LIFTWRIGHT_APT_UPDATED=1; fi
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null
  else
    echo "✗ Missing: $*. Install it once with:"
    echo "    sudo apt-get install -y $*"
    exit 1
  fi
}

# 1. npm dependencies: install when node_modules is missing or older than the lock file.
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "› Installing npm dependencies (npm ci)"
  npm ci --no-audit --no-fund
fi

# 2. PostgreSQL server binaries (Debian's packages; the cluster itself lives in .data/).
if ! ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then
  apt_install postgresql postgresql-contrib
fi

# 3. Chromium for the end-to-end tests (playwright-core drives /usr/bin/chromium).
if [ "$mode" = test ]; then
  [ -x /usr/bin/chromium ] || apt_install chromium
fi

exec node_modules/.bin/tsx scripts/stack.ts "$mode"
