#!/usr/bin/env bash
# npm run down: stop what `npm run up` started (app, worker, mail fake, PostgreSQL). Data stays in .data/.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib/services.sh"
zw_stop_services
bash "$ZW_ROOT/scripts/pg.sh" stop
