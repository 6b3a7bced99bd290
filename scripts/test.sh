#!/usr/bin/env bash
# npm test: the same set-up against a fresh test database, then type-check, lint, unit and
# integration tests (vitest) against a production build, the database fault test, end-to-end tests
# (Playwright on Debian's Chromium), and a check that the run left the work tree as it found it.
# Exits non-zero on the first failure. PostgreSQL, the services and the app run under the same
# supervisor as `npm start`.
source "$(dirname "$0")/lib.sh"

APP_PORT="${BW_TEST_APP_PORT:-3210}"
cleanup() { trap - INT TERM EXIT; stop_supervised; }
trap cleanup INT TERM EXIT
step() { log "── $* ──"; }

record_tree
ensure_node_modules
ensure_postgres_binaries
if [ ! -x /usr/bin/chromium ]; then apt_install chromium fonts-liberation; fi
export BW_CHROMIUM=/usr/bin/chromium

step "type-check"
./node_modules/.bin/tsc --noEmit -p .
step "lint"
./node_modules/.bin/eslint .

port_in_use "$APP_PORT" && die "$(port_taken_message "$APP_PORT" "set BW_TEST_APP_PORT.")"
start_postgres
ensure_database benchwright_test fresh
ensure_secret
export NODE_ENV=production APP_URL="http://127.0.0.1:$APP_PORT" NEXTAUTH_URL="http://127.0.0.1:$APP_PORT"
./node_modules/.bin/tsx scripts/check-env.ts
migrate
seed
TEST_DIST="${BW_TEST_DIST_DIR:-.next-test}"
build_app "$TEST_DIST"
start_services "${BW_TEST_SMTP_PORT:-54335}" "${BW_TEST_MAIL_HTTP_PORT:-54336}" "${BW_TEST_S3_PORT:-54337}"
BW_TEST_HOOKS=1 start_app "$APP_PORT" "$TEST_DIST" "$DATA/test-server.log"
export BW_BASE_URL="http://127.0.0.1:$APP_PORT" BW_APP_PORT="$APP_PORT"

step "unit and integration tests (vitest)"
# BW_VITEST_ARGS limits vitest to some files, BW_E2E_ARGS Playwright to some specs; BW_SKIP_E2E=1 skips
# Playwright (all three for quick local loops only).
# shellcheck disable=SC2086
./node_modules/.bin/vitest run ${BW_VITEST_ARGS:-}
# The fault test kills PostgreSQL, so it runs alone, after the others, and only on a server this
# run started (not on one another run, such as npm start, is using). BW_FAULT_TEST=0 leaves it out.
if [ "${BW_FAULT_TEST:-1}" = 1 ]; then
  step "fault test: PostgreSQL killed (SIGKILL) during saves, restarted by the supervisor"
  if [ "$BW_PG_OWNED" = 1 ]; then
    BW_FAULT_TEST=1 ./node_modules/.bin/vitest run tests/integration/fault-postgres.test.ts
  else
    log "skipped: PostgreSQL belongs to another run here (give npm test its own BW_DATA_DIR and BW_PG_PORT to run it)"
  fi
fi
if [ "${BW_SKIP_E2E:-}" = 1 ]; then
  log "skipping end-to-end tests (BW_SKIP_E2E=1)"
else
  step "end-to-end tests (Playwright, Chromium)"
  mkdir -p tests/artifacts
  # shellcheck disable=SC2086
  ./node_modules/.bin/playwright test ${BW_E2E_ARGS:-}
fi
step "work tree unchanged"
check_tree
log "all tests passed"
