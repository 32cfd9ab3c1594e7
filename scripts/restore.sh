#!/usr/bin/env bash
# npm run restore -- FOLDER [--force]: brings a backup written by npm run backup into the profile's
# database and bucket, which must be empty (--force replaces what they hold), checking every file's
# SHA-256 first; then applies any migration newer than the backup. Profile "dev" unless FW_PROFILE=test.
source "$(dirname "$0")/lib.sh"
fw_profile_env "${FW_PROFILE:-dev}"
[ $# -ge 1 ] || fail "usage: npm run restore -- FOLDER [--force]"
run_backup_tool restore-cli.js "$@"
run_migrations
