# Settings for one local profile: "dev" (npm start, npm run dev) or "test" (npm test).
# Each profile has its own data folder and ports, so tests never touch the database npm start uses.
# Any variable already set in the environment wins.
# shellcheck shell=bash

fw_profile_env() {
  local profile="$1" offset
  case "$profile" in
    dev) offset=0 ;;
    # FW_TEST_SLOT=1..9 gives a test profile of its own (ports and data apart), so several people working in one
    # tree can run e2e tests side by side; npm test and CI use the plain test profile.
    # Slots take offsets 41–49: the app port (3000 + 10 × offset, 3410–3490) then lies above every slot's
    # MariaDB port (3307 + offset, 3348–3356), and the mail fake's SMTP ports (1066–1074) below its web ports.
    test) offset=$((${FW_TEST_SLOT:-0} ? 40 + ${FW_TEST_SLOT:-0} : 10)) ;;
    # npm run test:faults: its own MariaDB, Redis, fakes and API processes, which the fault tests stop on purpose.
    # FW_TEST_SLOT=1..9 gives it offsets 21–29 (data in .data/faults-slot<N>), so fault runs side by side never
    # stop each other's services; no port of those offsets meets one of dev, test, faults or the test slots.
    faults) offset=$((20 + ${FW_TEST_SLOT:-0})) ;;
    *) echo "unknown profile $profile" >&2; return 1 ;;
  esac
  export FW_PROFILE="$profile"
  local folder="$profile"
  if [ "$profile" = test ] && [ -n "${FW_TEST_SLOT:-}" ]; then folder="test-slot$FW_TEST_SLOT"; fi
  if [ "$profile" = faults ] && [ -n "${FW_TEST_SLOT:-}" ]; then folder="faults-slot$FW_TEST_SLOT"; fi
  export FW_DATA="${FW_DATA:-$ROOT/.data/$folder}"
  export FW_RUN="$FW_DATA/run" FW_LOGS="$FW_DATA/logs"

  export NODE_ENV="${NODE_ENV:-$([ "$profile" = test ] && echo test || echo development)}"
  export PORT="${PORT:-$((3000 + offset * 10))}"
  export HOST="${HOST:-127.0.0.1}"
  export APP_ORIGIN="${APP_ORIGIN:-http://localhost:$PORT}"

  export DB_HOST="${DB_HOST:-127.0.0.1}"
  export DB_PORT="${DB_PORT:-$((3307 + offset))}"
  export DB_USER="${DB_USER:-fitwright}"
  export DB_PASSWORD="${DB_PASSWORD:-fitwright-local}"
  export DB_NAME="${DB_NAME:-$([ "$profile" = test ] && echo fitwright_test || echo fitwright)}"

  export REDIS_HOST="${REDIS_HOST:-127.0.0.1}"
  export REDIS_PORT="${REDIS_PORT:-$((6380 + offset))}"
  export QUEUE_PREFIX="${QUEUE_PREFIX:-fitwright-$profile}"

  export S3_FAKE_PORT="${S3_FAKE_PORT:-$((4569 + offset))}"
  export S3_FAKE_DIR="$FW_DATA/s3"
  export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$S3_FAKE_PORT}"
  export S3_PUBLIC_ENDPOINT="${S3_PUBLIC_ENDPOINT:-http://localhost:$S3_FAKE_PORT}"
  export S3_REGION="${S3_REGION:-us-east-1}"
  export S3_BUCKET="${S3_BUCKET:-fitwright-media}"
  export S3_ACCESS_KEY_ID="${S3_ACCESS_KEY_ID:-S3RVER}"
  export S3_SECRET_ACCESS_KEY="${S3_SECRET_ACCESS_KEY:-S3RVER}"
  export S3_FORCE_PATH_STYLE="${S3_FORCE_PATH_STYLE:-true}"
  # The studio's origins: the app itself and, in dev, Vite's server.
  export S3_CORS_ORIGINS="${S3_CORS_ORIGINS:-$APP_ORIGIN,http://127.0.0.1:$PORT,http://localhost:5173}"

  export MAIL_FAKE_SMTP_PORT="${MAIL_FAKE_SMTP_PORT:-$((1025 + offset))}"
  export MAIL_FAKE_WEB_PORT="${MAIL_FAKE_WEB_PORT:-$((1080 + offset))}"
  export MAIL_FAKE_DIR="$FW_DATA/mail"
  export MAIL_INBOX_URL="${MAIL_INBOX_URL:-http://127.0.0.1:$MAIL_FAKE_WEB_PORT}"
  export SMTP_HOST="${SMTP_HOST:-127.0.0.1}"
  export SMTP_PORT="${SMTP_PORT:-$MAIL_FAKE_SMTP_PORT}"
  export SMTP_IGNORE_TLS="${SMTP_IGNORE_TLS:-true}"
  export MAIL_FROM="${MAIL_FROM:-Fitwright <no-reply@fitwright.local>}"

  # Proxies whose X-Forwarded-For is believed (a hop count, or addresses/CIDRs/"loopback"); empty trusts nobody, as
  # an API listening directly must. The test profile trusts loopback: its helpers act as a local proxy that gives each
  # test client its own address. Behind a load balancer, set it to the balancer's addresses.
  export TRUST_PROXY="${TRUST_PROXY:-$([ "$profile" = test ] && echo loopback || true)}"
  # Signs CSRF tokens to their session; a fixed local value so restarts keep browsers' tokens valid. Production sets its own.
  export CSRF_SECRET="${CSRF_SECRET:-fitwright-local-$profile-csrf-key-not-for-production}"

  # Accounts with these (verified) e-mail addresses become site admins; comma separated, optional.
  # Every browser journey signs in from the same address (127.0.0.1), as a whole shop behind one router would;
  # the test profile allows more attempts a minute so the journeys do not trip over each other. The limit itself
  # is tested with its own low setting (api/test/auth.e2e-spec.ts).
  export AUTH_RATE_LIMIT="${AUTH_RATE_LIMIT:-$([ "$profile" = test ] && echo 200 || echo 10)}"
  # Public calculators, per client address a minute (all tools / the text tools); the browser journeys need room.
  export TOOLS_RATE_LIMIT="${TOOLS_RATE_LIMIT:-$([ "$profile" = test ] && echo 10000 || echo 300)}"
  export TOOLS_TEXT_RATE_LIMIT="${TOOLS_TEXT_RATE_LIMIT:-$([ "$profile" = test ] && echo 1000 || echo 30)}"
  # The test profile names the one the browser journey signs up with.
  export ADMIN_EMAILS="${ADMIN_EMAILS:-$([ "$profile" = test ] && echo journey-admin@fitwright.test || true)}"

  # Largest footage upload accepted, in bytes (20 GB).
  export FOOTAGE_MAX_BYTES="${FOOTAGE_MAX_BYTES:-20000000000}"

  export STUDIO_DIST="${STUDIO_DIST:-$ROOT/studio/dist}"
  export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
  mkdir -p "$FW_RUN" "$FW_LOGS"
}
