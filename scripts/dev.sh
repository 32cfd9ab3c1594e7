#!/usr/bin/env bash
# npm run dev: the dev profile's services, the API rebuilt and restarted on change,
# and Vite's dev server with hot reload on http://localhost:5173 (proxying /api to the API).
source "$(dirname "$0")/lib.sh"
fw_profile_env dev
export STUDIO_DIST=""   # Vite serves the studio in dev

ensure_debian_packages mariadbd=mariadb-server redis-server=redis-server ffmpeg=ffmpeg ffprobe=ffmpeg
ensure_npm_dependencies
trap 'stop_services' EXIT
trap 'say "stopping"; exit 130' INT TERM
start_services
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/package-lock.json"
run_migrations

(cd "$ROOT/api" && exec node "$ROOT/node_modules/typescript/bin/tsc" -p tsconfig.build.json --watch --preserveWatchOutput) &
FW_STARTED_PIDS+=($!)
(cd "$ROOT/api" && exec node --watch-path=dist --watch-preserve-output dist/main.js) &
FW_STARTED_PIDS+=($!)
(cd "$ROOT/studio" && exec node "$ROOT/node_modules/vite/bin/vite.js") &
FW_STARTED_PIDS+=($!)
say "studio with hot reload: http://localhost:5173 (API on :$PORT, inbox $MAIL_INBOX_URL)"
wait -n
