#!/usr/bin/env bash
# Runs one benchmark against the local services of a profile (default "dev", the ones `npm start` uses):
#   bash bench/run.sh upload            # 1 GB through the app's presigned multipart path vs @aws-sdk/lib-storage
#   bash bench/run.sh transcript        # 3-hour, 3,000-cue transcript: parse+store via the API vs the `subtitle` parser
#   bash bench/run.sh forgot-password   # "forgot password" answer time: existing vs unknown address (ratio ≈ 1.0)
#   bash bench/run.sh extract           # 200,000-char measurement extraction: 8× text over 1×, and a fits call's wait during it
#   bash bench/run.sh load              # autocannon on the public reads (follow-along with and without If-None-Match) vs the static index
#   bash bench/run.sh upload test       # against the test profile's services instead
# Services already running (e.g. under `npm start`) are reused; any this script starts are stopped at the end.
# The benchmark starts its own API process from api/dist on a spare port so it can watch that process's memory.
source "$(dirname "$0")/../scripts/lib.sh"
name="${1:?usage: bash bench/run.sh upload|transcript|forgot-password|extract|load [dev|test]}"
fw_profile_env "${2:-dev}"
[ -f "$ROOT/bench/$name/run.mjs" ] || fail "no benchmark named $name"
trap 'stop_services' EXIT
start_services
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
run_migrations >/dev/null
export BENCH_DATA="$FW_DATA/bench"
mkdir -p "$BENCH_DATA"
node "$ROOT/bench/$name/run.mjs"
