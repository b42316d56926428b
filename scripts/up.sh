#!/usr/bin/env bash
# npm run up: everything a newcomer needs, on a fresh machine or again on a running one.
# Installs what is missing, starts PostgreSQL and the mail fake, migrates, seeds the demo, builds,
# and serves on http://127.0.0.1:$PORT in the background; returns once the app answers.
# `npm run down` stops it. Re-running rebuilds and restarts the app and keeps the data.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib/services.sh"
source "$ZW_ROOT/scripts/lib/env.sh"
cd "$ZW_ROOT"

zw_node_modules
bash scripts/pg.sh start
node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts
# The running app reads .next, so it stops before the build replaces it.
zw_stop_app
zw_say "building the app (next build)"
node_modules/.bin/next build >"$ZW_DATA/log/build.log" 2>&1 || { tail -n 40 "$ZW_DATA/log/build.log" >&2; zw_fail "next build failed (log: .data/log/build.log)"; }
zw_start_services
zw_say "Zonewright is up on $APP_URL (demo accounts: owner@example.com … viewer@example.com, password zonewright-demo)"
zw_say "stop it with: npm run down"
