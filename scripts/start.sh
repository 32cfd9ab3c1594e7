#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB, Redis and the local fakes, migrate,
# load the demo scenario, build and serve everything at http://localhost:$PORT. Ctrl-C stops it all.
source "$(dirname "$0")/lib.sh"
prepare_dev_app

say "Fitwright:      http://localhost:$PORT"
say "API docs:       http://localhost:$PORT/api/docs"
say "mail inbox:     $MAIL_INBOX_URL"
say "S3 fake:        $S3_ENDPOINT"
say "logs and data:  $FW_DATA"
say "Ctrl-C stops everything started here."
(cd "$ROOT/api" && exec node dist/main.js) &
FW_STARTED_PIDS+=($!)
wait "${FW_STARTED_PIDS[-1]}"
