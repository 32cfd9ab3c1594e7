#!/usr/bin/env bash
# npm run restore -- FOLDER [--force]: brings a backup written by npm run backup into the profile's
# database and bucket, which must be empty (--force replaces what they hold), checking every file's
# SHA-256 first; then applies any migration newer than the backup. Profile "dev" unless FW_PROFILE=test.
source "$(dirname "$0")/lib.sh"
fw_profile_env "${FW_PROFILE:-dev}"
# Folders given on the command line are relative to where npm run was called, not to api/.
absolute_arguments() {
  local arg
  FW_ARGS=()
  for arg in "$@"; do
    case "$arg" in
      -*) FW_ARGS+=("$arg") ;;
      *) FW_ARGS+=("$(cd "${INIT_CWD:-$PWD}" && realpath -m -- "$arg")") ;;
    esac
  done
}
absolute_arguments "$@"
[ $# -ge 1 ] || fail "usage: npm run restore -- FOLDER [--force]"
ensure_npm_dependencies
# On the test profile, wait for a running npm test (it resets the database) as with-test-services.sh does.
if [ "$FW_PROFILE" = test ]; then
  exec 9>"$FW_DATA/test-run.lock"
  flock 9 || fail "could not take the test lock"
fi
trap 'stop_services' EXIT
trap 'exit 130' INT TERM
# On an empty instance this initialises MariaDB and creates the empty database and its user.
start_mariadb >/dev/null
start_node_service s3-fake "$S3_FAKE_PORT" local-services/s3/server.js
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
(cd "$ROOT/api" && node dist/database/backup/restore-cli.js "${FW_ARGS[@]}")
run_migrations
