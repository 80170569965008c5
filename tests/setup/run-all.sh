#!/usr/bin/env bash
# npm test: installs what is missing, starts PostgreSQL, builds, runs every test, stops what it started.
# Runs side by side with another npm test (in this checkout or another): databases are per run, the build is
# made under a lock and only when a source changed, and the last run out stops the cluster a run started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."

say() { printf 'betasift test: %s\n' "$*"; }
started_at=$SECONDS

export BETASIFT_TEST_RUN="${BETASIFT_TEST_RUN:-r$$}"
runs_dir=.cache/test-runs
mkdir -p "$runs_dir" tests/artifacts

# One install at a time; a second run waits for the first's.
(
  flock 9
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    say "installing dependencies (npm ci)"
    npm ci --no-audit --no-fund
  fi
) 9>.cache/install.lock

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
  (
    flock 9
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  ) 9>.cache/apt.lock
fi

# The cluster is shared by the runs of this checkout: each run leaves a mark while it runs.
(
  flock 9
  if ! bash docker-free-pg.sh status >/dev/null 2>&1; then touch "$runs_dir/started-cluster"; fi
  # The server must not inherit the lock's descriptor, or the lock outlives this run.
  bash docker-free-pg.sh up 9>&-
) 9>"$runs_dir/.lock"
mark="$runs_dir/run-$$"
echo $$ > "$mark"
cleanup() {
  (
    flock 9
    rm -f "$mark"
    for other in "$runs_dir"/run-*; do
      [ -e "$other" ] || continue
      # A mark whose process is gone was left by a run that was killed.
      kill -0 "$(cat "$other")" 2>/dev/null && exit 0
      rm -f "$other"
    done
    if [ -e "$runs_dir/started-cluster" ]; then
      rm -f "$runs_dir/started-cluster"
      bash docker-free-pg.sh down 9>&- || true
    fi
  ) 9>"$runs_dir/.lock"
}
trap cleanup EXIT

step_started=$SECONDS
(
  flock 9
  say "type-checking"
  ./node_modules/.bin/react-router typegen >/dev/null
  ./node_modules/.bin/tsc --noEmit
  ./node_modules/.bin/tsx tests/setup/build.ts
) 9>.cache/build.lock
say "type-check and build: $((SECONDS - step_started)) s"

report="tests/artifacts/vitest-$BETASIFT_TEST_RUN.json"
status=0
./node_modules/.bin/vitest run --reporter=default --reporter=./tests/setup/duration-reporter.ts --reporter=json --outputFile.json="$report" "$@" || status=$?

# One plain closing line that any CI reads.
if [ -f "$report" ]; then
  mv "$report" tests/artifacts/vitest.json
  node -e '
    const r = JSON.parse(require("fs").readFileSync("tests/artifacts/vitest.json", "utf8"));
    console.log(`${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests + r.numTodoTests} skipped`);
  '
fi
say "npm test took $((SECONDS - started_at)) s in all"
exit "$status"
