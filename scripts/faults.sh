#!/usr/bin/env bash
# npm run test:faults: fault tests on their own profile ("faults": its own MariaDB, Redis, S3 and mail
# fakes and API processes under .data/faults/, started by the tests themselves, which stop and kill
# them on purpose). Never touches the dev or test profile's services. Extra arguments go to Jest.
if [ -n "${FW_PROFILE:-}" ] && [ "$FW_PROFILE" != faults ]; then
  # Called from another profile's script (npm test): inherit none of its ports or folders.
  exec env -i HOME="$HOME" PATH="$PATH" TERM="${TERM:-dumb}" ${FW_TEST_SLOT:+FW_TEST_SLOT="$FW_TEST_SLOT"} bash "$0" "$@"
fi
source "$(dirname "$0")/lib.sh"
fw_profile_env faults
exec 8>"$FW_DATA/faults-run.lock"
flock 8 || fail "could not take the fault-test lock"

ensure_debian_packages mariadbd=mariadb-server redis-server=redis-server ffmpeg=ffmpeg ffprobe=ffmpeg
build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
cd "$ROOT/api" && npx jest --config jest.faults.config.js --runInBand "$@"
