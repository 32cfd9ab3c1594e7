#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB, Redis and the local fakes, migrate,
# load the demo scenario, build and serve everything at http://localhost:$PORT. Ctrl-C stops it all.
source "$(dirname "$0")/lib.sh"
fw_profile_env dev

# espeak-ng narrates the generated demo footage (without it the demo video is silent).
ensure_debian_packages mariadbd=mariadb-server redis-server=redis-server ffmpeg=ffmpeg ffprobe=ffmpeg espeak-ng=espeak-ng
ensure_npm_dependencies
trap 'stop_services' EXIT
trap 'say "stopping"; exit 130' INT TERM
start_services
build_all
run_migrations
# The invented demo scenario (accounts, the Harrow Lane Garage workshop, its fit data); idempotent.
(cd "$ROOT/api" && node dist/database/demo/load-demo.js)

say "Fitwright:      http://localhost:$PORT"
say "API docs:       http://localhost:$PORT/api/docs"
say "mail inbox:     $MAIL_INBOX_URL"
say "S3 fake:        $S3_ENDPOINT"
say "logs and data:  $FW_DATA"
say "Ctrl-C stops everything started here."
(cd "$ROOT/api" && exec node dist/main.js) &
FW_STARTED_PIDS+=($!)
wait "${FW_STARTED_PIDS[-1]}"
