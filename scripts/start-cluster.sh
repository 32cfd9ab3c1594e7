#!/usr/bin/env bash
# npm run start:cluster: as npm start (profile dev: services, build, migrations, demo), then two API processes
# (PORT+1, PORT+2), one queue-only worker and a round-robin proxy on PORT (3000) in front of them, all on the same
# MariaDB, Redis and storage (scripts/cluster.mjs). Ctrl-C stops everything started here.
source "$(dirname "$0")/lib.sh"
prepare_dev_app

say "Fitwright (cluster): http://localhost:$PORT  (API processes on $((PORT + 1)) and $((PORT + 2)), one worker)"
say "mail inbox:     $MAIL_INBOX_URL"
say "logs and data:  $FW_DATA"
node "$ROOT/scripts/cluster.mjs" &
FW_STARTED_PIDS+=($!)
wait "${FW_STARTED_PIDS[-1]}"
