#!/usr/bin/env bash
# Entry point of `npm start`, `npm test` and the other stack commands.
# Installs what a fresh machine lacks (node modules, PostgreSQL, and for the
# test and bench modes chromium and ngspice) from the npm registry and
# Debian's packages, then hands over to scripts/stack.ts.
set -euo pipefail
cd "$(dirname "$0")/.."
mode="${1:-start}"
shift || true

apt_missing=()
pg_bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
if [ -z "$pg_bin" ] || [ ! -x "$pg_bin/postgres" ] || ! command -v pg_dump >/dev/null; then
  apt_missing+=(postgresql postgresql-client)
fi
case "$mode" in
  test|bench|load|fuzz)
    [ -x /usr/bin/chromium ] || apt_missing+=(chromium)
    command -v ngspice >/dev/null || apt_missing+=(ngspice)
    ;;
esac
if [ ${#apt_missing[@]} -gt 0 ]; then
  if [ "$(id -u)" != "0" ]; then
    echo "heatsplit: missing Debian packages: ${apt_missing[*]} (run as root to install them)" >&2
    exit 1
  fi
  echo "heatsplit: installing Debian packages: ${apt_missing[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq --no-install-recommends "${apt_missing[@]}" >/dev/null
  # The Debian package starts its own cluster on 5432; Heatsplit runs its
  # own server inside the project, so stop the packaged one if it started.
  if command -v pg_ctlcluster >/dev/null; then
    for c in $(pg_lsclusters -h 2>/dev/null | awk '$4=="online"{print $1"/"$2}'); do
      pg_ctlcluster "${c%/*}" "${c#*/}" stop || true
    done
  fi
fi

if [ ! -x node_modules/.bin/next ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "heatsplit: installing node modules (npm ci)"
  npm ci --no-audit --no-fund
fi

# One test or bench stack at a time on this machine (they share fixed ports).
if [ "$mode" != "start" ]; then
  mkdir -p .data
  exec flock ".data/$mode.lock" node --import tsx scripts/stack.ts "$mode" "$@"
fi
exec node --import tsx scripts/stack.ts "$mode" "$@"
