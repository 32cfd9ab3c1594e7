#!/usr/bin/env bash
# Runs one command against the test profile's services (MariaDB, Redis, S3 and mail fakes), e.g.
#   bash scripts/with-test-services.sh npm test -w api -- test/fit-checks
# It takes the same lock as npm test, starts what is not running, migrates, runs the command from
# the current folder, and stops what it started.
source "$(dirname "$0")/lib.sh"
use_test_services
# Quiet when all is well; a failed build or migration shows why instead of exiting silently.
quietly() { local out; out="$("$@" 2>&1)" || { printf '%s\n' "$out" >&2; fail "failed: $*"; }; }
quietly build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
quietly run_migrations
"$@"
