#!/usr/bin/env bash
# npm run backup [-- FOLDER]: a consistent dump of the profile's MariaDB database and a copy of its
# bucket (through the S3 API), with a manifest, into FOLDER or .data/<profile>/backups/<UTC time>/.
# Profile "dev" (the one npm start uses) unless FW_PROFILE=test. Starts MariaDB and the S3 fake only if
# they are not running, and stops only what it started.
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
ensure_npm_dependencies
# On the test profile, wait for a running npm test (it resets the database) as with-test-services.sh does.
if [ "$FW_PROFILE" = test ]; then
  exec 9>"$FW_DATA/test-run.lock"
  flock 9 || fail "could not take the test lock"
fi
trap 'stop_services' EXIT
trap 'exit 130' INT TERM
start_mariadb >/dev/null
start_node_service s3-fake "$S3_FAKE_PORT" local-services/s3/server.js
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
(cd "$ROOT/api" && node dist/database/backup/backup-cli.js "${FW_ARGS[@]}")
