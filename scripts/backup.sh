#!/usr/bin/env bash
# npm run backup [-- FOLDER]: a consistent dump of the profile's MariaDB database and a copy of its
# bucket (through the S3 API), with a manifest, into FOLDER or .data/<profile>/backups/<UTC time>/.
# Profile "dev" (the one npm start uses) unless FW_PROFILE=test.
source "$(dirname "$0")/lib.sh"
fw_profile_env "${FW_PROFILE:-dev}"
run_backup_tool backup-cli.js "$@"
