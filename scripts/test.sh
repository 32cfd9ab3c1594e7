#!/usr/bin/env bash
# npm test: the same set-up as npm start on a separate profile (own data folder, ports and a fresh
# test database), then lint, type checks, API unit and e2e tests, studio component tests and the
# browser journeys. Every step runs; the exit code is non-zero if any failed. Stops all it started.
source "$(dirname "$0")/lib.sh"
fw_profile_env test
# One test run at a time per checkout: a second run waits rather than resetting the database under the first.
exec 9>"$FW_DATA/test-run.lock"
flock 9 || fail "could not take the test lock"

ensure_debian_packages mariadbd=mariadb-server redis-server=redis-server ffmpeg=ffmpeg ffprobe=ffmpeg chromium=chromium
ensure_npm_dependencies
trap 'stop_services' EXIT
trap 'exit 130' INT TERM
start_services
reset_database
redis-cli -h 127.0.0.1 -p "$REDIS_PORT" flushall >/dev/null
build_all
run_migrations

failed=()
step() {
  local name="$1"; shift
  say "── $name"
  local started=$SECONDS
  if (cd "$ROOT" && "$@"); then
    say "   $name passed in $((SECONDS - started)) s"
  else
    say "   $name FAILED"
    failed+=("$name")
  fi
}

step "lint" npx eslint --max-warnings=0 .
step "lint walls: each shown to fire" node --test scripts/lint-rules.test.mjs
step "typecheck api" npm run typecheck -w api --silent
step "typecheck studio" npm run typecheck -w studio --silent
step "API contract is current (npm run contract rewrites it)" node scripts/contract.mjs --check
step "dependency audit: its own tests" node --test scripts/audit.test.mjs
step "dependency audit (npm audit; continues when the advisory service does not answer)" node scripts/audit.mjs
step "api tests (unit + e2e on real services)" npm test -w api --silent
step "studio component tests" npm test -w studio --silent
step "viewer bundle budget (public routes: JS ≤ 250 KB gz, CSS ≤ 40 KB gz, no editor code)" node --test studio/scripts/viewer-budget.test.mjs
# Its own profile ("faults"): it starts, stops and kills its own MariaDB, Redis and API processes, never these.
step "fault tests (MariaDB and Redis restarted, API killed mid-job)" bash scripts/faults.sh

# The browser journeys run against the built app served by its own process, as npm start serves it.
(cd "$ROOT/api" && exec node dist/main.js) >"$FW_LOGS/api.log" 2>&1 &
FW_STARTED_PIDS+=($!)
if wait_for "the app" 120 http_ok "http://127.0.0.1:$PORT/api/health"; then
  step "browser journeys (Playwright + Chromium)" npm run e2e -w studio --silent
fi

if [ ${#failed[@]} -gt 0 ]; then
  say "failed: ${failed[*]}"
  exit 1
fi
say "all test steps passed"
