#!/usr/bin/env bash
# npm test: installs what is missing, starts PostgreSQL, builds, runs every test, stops what it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."

say() { printf 'betasift test: %s\n' "$*"; }

if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  say "installing dependencies (npm ci)"
  npm ci --no-audit --no-fund
fi

# Debian's packages the tests need: Chromium for the browser tests, ngspice for the reference simulations.
missing=()
[ -x "${CHROMIUM_PATH:-/usr/bin/chromium}" ] || missing+=(chromium)
command -v ngspice >/dev/null 2>&1 || missing+=(ngspice)
if [ "${#missing[@]}" -gt 0 ]; then
  if [ "$(id -u)" -ne 0 ]; then
    say "missing Debian packages: ${missing[*]}; install them as root (apt-get install ${missing[*]})"
    exit 1
  fi
  say "installing ${missing[*]} from Debian's packages"
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
fi

started_pg=no
if ! bash docker-free-pg.sh status >/dev/null 2>&1; then started_pg=yes; fi
bash docker-free-pg.sh up
cleanup() { if [ "$started_pg" = yes ]; then bash docker-free-pg.sh down || true; fi; }
trap cleanup EXIT

say "type-checking"
./node_modules/.bin/react-router typegen >/dev/null
./node_modules/.bin/tsc --noEmit

say "building the app the tests run against"
./node_modules/.bin/react-router build >/dev/null

mkdir -p tests/artifacts
status=0
./node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json=tests/artifacts/vitest.json "$@" || status=$?

# One plain closing line that any CI reads.
if [ -f tests/artifacts/vitest.json ]; then
  node -e '
    const r = JSON.parse(require("fs").readFileSync("tests/artifacts/vitest.json", "utf8"));
    console.log(`${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests + r.numTodoTests} skipped`);
  '
fi
exit "$status"
