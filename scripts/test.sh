#!/usr/bin/env bash
# npm test: every test on a fresh machine. Installs what is missing (Debian: postgresql, chromium,
# python3-gdspy, klayout; npm ci), starts the cluster, recreates the zonewright_test database, migrates
# and seeds it, builds the app and serves it on 127.0.0.1:3100 with the mail fake on 2526, runs
# vitest over tests/, stops everything it started (even on failure) and exits with vitest's code.
# Extra arguments go to vitest, e.g. `npm test -- tests/unit/lang`.
set -euo pipefail
export ZW_RUN=test
source "$(dirname "${BASH_SOURCE[0]}")/lib/services.sh"
source "$ZW_ROOT/scripts/lib/env.sh"
cd "$ZW_ROOT"

# One test run at a time per checkout: runs share the test database, ports and .next.
exec 9>"$ZW_DATA/run/test.lock"
if ! flock -n 9; then
  zw_say "another npm test is running in this checkout; waiting for it to finish"
  flock -w 3600 9 || zw_fail "gave up waiting for the other test run"
fi

zw_apt_need /usr/bin/chromium chromium
zw_apt_need klayout klayout
/usr/bin/python3 -c 'import gdspy' 2>/dev/null || zw_apt_install python3-gdspy
zw_node_modules

pg_was_running=false
bash scripts/pg.sh status >/dev/null 2>&1 && pg_was_running=true

cleanup() {
  local code=$?
  zw_stop_services test || true
  if [ "$pg_was_running" = false ]; then bash scripts/pg.sh stop || true; fi
  # The last line: "N passed, N failed" in plain words, for tools that read the end of the log.
  if [ -n "${summary:-}" ] && [ -f "$summary" ]; then
    node -e 'const r = require(process.argv[1]); console.log(`tests: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${r.numPendingTests + r.numTodoTests} skipped`)' "$summary"
  fi
  exit "$code"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

bash scripts/pg.sh start
node_modules/.bin/tsx scripts/migrate.ts --recreate
node_modules/.bin/tsx scripts/seed.ts
if [ -f "$ZW_DATA/run/app.pid" ] && kill -0 "$(cat "$ZW_DATA/run/app.pid")" 2>/dev/null; then
  zw_say "stopping the app of 'npm run up': the test build replaces .next (run 'npm run up' again afterwards)"
  zw_stop_app
fi
zw_say "building the app (next build)"
node_modules/.bin/next build >"$ZW_DATA/log/build-test.log" 2>&1 || { tail -n 60 "$ZW_DATA/log/build-test.log" >&2; zw_fail "next build failed (log: .data/log/build-test.log)"; }
zw_start_services test

set +e
summary="$ZW_DATA/run/vitest-summary.json"
rm -f "$summary"
VITE_CONFIG_NATIVE_IGNORE_WARNING=true node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json="$summary" "$@"
status=$?

set -e
[ "$status" -eq 0 ] || zw_say "tests failed; service logs are in .data/log/"
exit "$status"
