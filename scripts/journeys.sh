#!/usr/bin/env bash
# Runs browser journeys against the test services without the rest of npm test, e.g.
#   bash scripts/journeys.sh studio/e2e/marks.test.mjs
# (no argument: every journey). Builds what changed, serves the app as npm test does, stops it after.
source "$(dirname "$0")/lib.sh"
use_test_services
build_all >/dev/null
run_migrations >/dev/null
(cd "$ROOT/api" && exec node dist/main.js) >"$FW_LOGS/api.log" 2>&1 &
FW_STARTED_PIDS+=($!)
wait_for "the app" 120 http_ok "http://127.0.0.1:$PORT/api/health" || fail "the app did not start; see $FW_LOGS/api.log"
cd "$ROOT"
if [ $# -eq 0 ]; then set -- studio/e2e/*.test.mjs; fi
node --test --test-concurrency=1 "$@"
