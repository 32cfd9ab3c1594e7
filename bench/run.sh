#!/usr/bin/env bash
# Runs one benchmark against the local services of a profile (default "dev", the ones `npm start` uses):
#   bash bench/run.sh upload            # 1 GB through the app's presigned multipart path vs @aws-sdk/lib-storage
#   bash bench/run.sh transcript        # 3-hour, 3,000-cue transcript: parse+store via the API vs the `subtitle` parser
#   bash bench/run.sh forgot-password   # "forgot password" answer time: existing vs unknown address (ratio ≈ 1.0)
#   bash bench/run.sh extract           # 200,000-char measurement extraction: 8× text over 1×, and a fits call's wait during it
#   bash bench/run.sh load              # autocannon on the public reads (follow-along with and without If-None-Match) vs the static index
#   bash bench/run.sh fanout            # fit news to 10,000 followers: transition → outbox → relay → SMTP vs a plain pooled nodemailer loop
#   bash bench/run.sh transcode         # 10-minute 1080p clip: media pipeline vs ffmpeg alone, same arguments (--minutes N for shorter)
#   bash bench/run.sh fanout            # fit news to 10,000 followers: transition → outbox → relay → SMTP vs a plain pooled nodemailer loop
#   bash bench/run.sh upload test       # against the test profile's services instead
# Services already running (e.g. under `npm start`) are reused; any this script starts are stopped at the end.
# The benchmark starts its own API process from api/dist on a spare port so it can watch that process's memory.
source "$(dirname "$0")/../scripts/lib.sh"
name="${1:?usage: bash bench/run.sh upload|transcript|forgot-password|extract|load|transcode [dev|test] [--flags of the benchmark]}"
shift
profile=dev
if [ $# -gt 0 ] && [[ "$1" != --* ]]; then profile="$1"; shift; fi
fw_profile_env "$profile"
[ -f "$ROOT/bench/$name/run.mjs" ] || fail "no benchmark named $name"
trap 'stop_services' EXIT
start_services
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
run_migrations >/dev/null
export BENCH_DATA="$FW_DATA/bench"
mkdir -p "$BENCH_DATA"
node "$ROOT/bench/$name/run.mjs" "$@"
