# Shared steps of scripts/start.sh, scripts/test.sh and scripts/dev.sh.
# shellcheck shell=bash
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export ROOT
# shellcheck source=scripts/env.sh
source "$ROOT/scripts/env.sh"

FW_STARTED_PIDS=()
FW_STARTED_MARIADB=""

say() { printf '\033[1m[fitwright]\033[0m %s\n' "$*"; }
fail() { printf '\033[1;31m[fitwright]\033[0m %s\n' "$*" >&2; exit 1; }
as_root() { if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi; }

# Installs the Debian packages whose commands are missing. Arguments: command=package pairs.
ensure_debian_packages() {
  local missing=() pair
  for pair in "$@"; do
    command -v "${pair%%=*}" >/dev/null 2>&1 || missing+=("${pair#*=}")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  say "installing Debian packages: ${missing[*]} (first time only)"
  as_root apt-get update -qq
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

# Runs `npm ci` when node_modules is missing or package-lock.json changed since the last install.
ensure_npm_dependencies() {
  local stamp="$ROOT/node_modules/.fitwright-lock-hash" want
  want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
  if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then return 0; fi
  say "installing npm dependencies (npm ci)"
  (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  echo "$want" > "$stamp"
}

wait_for() {
  local what="$1" tries="$2"; shift 2
  local i
  for ((i = 0; i < tries; i++)); do
    if "$@" >/dev/null 2>&1; then return 0; fi
    sleep 0.25
  done
  fail "$what did not come up; see $FW_LOGS"
}

port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

mariadb_ping() { mariadb-admin --no-defaults --socket="$FW_RUN/mysqld.sock" -uroot ping; }
mariadb_root() { mariadb --no-defaults --socket="$FW_RUN/mysqld.sock" -uroot "$@"; }

start_mariadb() {
  local datadir="$FW_DATA/mariadb"
  if mariadb_ping >/dev/null 2>&1; then
    say "MariaDB already running on 127.0.0.1:$DB_PORT"
  else
    if [ ! -d "$datadir/mysql" ]; then
      say "initialising MariaDB data in $datadir"
      mkdir -p "$datadir"
      mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$datadir" \
        --auth-root-authentication-method=normal --skip-test-db >"$FW_LOGS/mariadb-install.log" 2>&1
    fi
    # Temporary tables and sort files go beside the data, not in /tmp, where a cleaner can delete them mid-query
    # (a full-size benchmark's FULLTEXT build and large sorts failed that way).
    mkdir -p "$FW_DATA/mariadb-tmp"
    mariadbd --no-defaults --user="$(id -un)" --datadir="$datadir" --tmpdir="$FW_DATA/mariadb-tmp" \
      --socket="$FW_RUN/mysqld.sock" --pid-file="$FW_RUN/mysqld.pid" \
      --port="$DB_PORT" --bind-address=127.0.0.1 --skip-name-resolve \
      --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --skip-log-bin --log-error="$FW_LOGS/mariadb.err" >/dev/null 2>&1 &
    FW_STARTED_MARIADB=$!
    wait_for "MariaDB" 120 mariadb_ping
    say "MariaDB on 127.0.0.1:$DB_PORT (data in $datadir)"
  fi
  mariadb_root <<SQL
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'localhost';
SQL
}

reset_database() {
  mariadb_root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
}

start_redis() {
  if redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping >/dev/null 2>&1; then
    say "Redis already running on 127.0.0.1:$REDIS_PORT"
    return 0
  fi
  mkdir -p "$FW_DATA/redis"
  # Append-only persistence so queued jobs survive a restart.
  redis-server --port "$REDIS_PORT" --bind 127.0.0.1 --dir "$FW_DATA/redis" --appendonly yes \
    --save '' --logfile "$FW_LOGS/redis.log" >/dev/null 2>&1 &
  FW_STARTED_PIDS+=($!)
  wait_for "Redis" 80 redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping
  say "Redis on 127.0.0.1:$REDIS_PORT"
}

start_node_service() {
  local name="$1" port="$2" script="$3"
  if port_open "$port"; then
    say "$name already answering on port $port"
    return 0
  fi
  # Under a supervisor that starts the fake again if it dies (with back-off, logged in the same file);
  # stopping the supervisor stops the fake, so stop_services still ends everything it started.
  node "$ROOT/local-services/supervise.js" "$name" "$ROOT/$script" >"$FW_LOGS/$name.log" 2>&1 &
  FW_STARTED_PIDS+=($!)
  wait_for "$name" 80 port_open "$port"
}

start_local_fakes() {
  start_node_service s3-fake "$S3_FAKE_PORT" local-services/s3/server.js
  say "S3 fake on $S3_ENDPOINT (bucket $S3_BUCKET, data in $S3_FAKE_DIR)"
  start_node_service mail-fake "$MAIL_FAKE_WEB_PORT" local-services/mail/server.js
  wait_for "mail fake SMTP" 40 port_open "$MAIL_FAKE_SMTP_PORT"
  say "mail fake: SMTP 127.0.0.1:$MAIL_FAKE_SMTP_PORT, inbox $MAIL_INBOX_URL"
}

start_services() {
  start_mariadb
  start_redis
  start_local_fakes
}

# Stops, in reverse order, every process this script started (and only those).
stop_services() {
  local pid i
  for ((i = ${#FW_STARTED_PIDS[@]} - 1; i >= 0; i--)); do
    pid="${FW_STARTED_PIDS[$i]}"
    kill -TERM "$pid" 2>/dev/null || true
  done
  if [ -n "$FW_STARTED_MARIADB" ]; then
    mariadb-admin --no-defaults --socket="$FW_RUN/mysqld.sock" -uroot shutdown >/dev/null 2>&1 ||
      kill -TERM "$FW_STARTED_MARIADB" 2>/dev/null || true
  fi
  for pid in "${FW_STARTED_PIDS[@]}" $FW_STARTED_MARIADB; do
    for ((i = 0; i < 40; i++)); do
      # A stopped child lingers as a zombie where PID 1 does not reap; check its state, not kill -0.
      [ "$(ps -o stat= -p "$pid" 2>/dev/null | cut -c1)" = "" ] && break
      [ "$(ps -o stat= -p "$pid" 2>/dev/null | cut -c1)" = "Z" ] && break
      sleep 0.25
    done
    kill -KILL "$pid" 2>/dev/null || true
  done
  FW_STARTED_PIDS=()
  FW_STARTED_MARIADB=""
}

# Rebuilds a workspace only when a source file is newer than its last build.
build_if_changed() {
  local workspace="$1" stamp="$ROOT/$1/dist/.fitwright-built"
  shift
  if [ -f "$stamp" ] && [ -z "$(find "$@" -newer "$stamp" -type f -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  # One build at a time across profiles: two runs writing one dist folder would mix their outputs.
  mkdir -p "$ROOT/.data"
  (
    flock 8
    if [ -f "$stamp" ] && [ -z "$(find "$@" -newer "$stamp" -type f -print -quit 2>/dev/null)" ]; then exit 0; fi
    say "building $workspace"
    (cd "$ROOT" && npm run build -w "$workspace" --silent)
    touch "$stamp"
  ) 8>"$ROOT/.data/build.lock"
}

# The studio's build script sets NODE_ENV=production itself: the profiles export development or test for
# the API, and Vite would otherwise emit React's development build (studio/e2e/shell.test.mjs checks).
build_all() {
  build_if_changed api "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/package-lock.json"
  build_if_changed studio "$ROOT/studio/src" "$ROOT/studio/index.html" "$ROOT/studio/vite.config.ts" "$ROOT/studio/package.json" "$ROOT/package-lock.json"
}

run_migrations() {
  (cd "$ROOT/api" && node dist/database/run-migrations.js)
}

# npm start and npm run start:cluster: install what is missing, start the dev profile's services (stopped when
# the script exits), build, migrate and load the invented demo scenario (idempotent).
prepare_dev_app() {
  fw_profile_env dev
  # espeak-ng narrates the generated demo footage (without it the demo video is silent).
  ensure_debian_packages mariadbd=mariadb-server redis-server=redis-server ffmpeg=ffmpeg ffprobe=ffmpeg espeak-ng=espeak-ng
  ensure_npm_dependencies
  trap 'stop_services' EXIT
  trap 'say "stopping"; exit 130' INT TERM
  start_services
  build_all
  run_migrations
  (cd "$ROOT/api" && node dist/database/demo/load-demo.js)
}

http_ok() { node -e 'fetch(process.argv[1]).then((r) => process.exit(r.ok ? 0 : 1), () => process.exit(1))' "$1"; }

# For scripts that run something on the test profile: takes the lock npm test takes (so no run resets
# the database under another), starts the services not running yet; they stop when the script exits.
use_test_services() {
  fw_profile_env test
  exec 9>"$FW_DATA/test-run.lock"
  flock 9 || fail "could not take the test lock"
  trap 'stop_services' EXIT
  trap 'exit 130' INT TERM
  start_services >/dev/null
}

# npm run backup / restore: runs api/dist/database/backup/<cli> on the current profile with the
# arguments given. Folders are taken relative to where npm run was called, not to api/. On the test
# profile it waits for a running npm test (which resets the database). Starts MariaDB and the S3 fake
# only if they are not running, and stops only what it started (at exit, so a caller may run more).
run_backup_tool() {
  local cli="$1" arg args=()
  shift
  for arg in "$@"; do
    case "$arg" in
      -*) args+=("$arg") ;;
      *) args+=("$(cd "${INIT_CWD:-$PWD}" && realpath -m -- "$arg")") ;;
    esac
  done
  ensure_npm_dependencies
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
  (cd "$ROOT/api" && node "dist/database/backup/$cli" "${args[@]}")
}
