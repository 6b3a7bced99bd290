#!/usr/bin/env bash
# npm test: the same set-up against a fresh test database, then type-check, lint, unit and
# integration tests (vitest) and end-to-end tests (Playwright on Debian's Chromium) against a
# production build. Exits non-zero on the first failure.
source "$(dirname "$0")/lib.sh"

APP_PORT="${BW_TEST_APP_PORT:-3210}"
cleanup() { trap - INT TERM EXIT; stop_children; stop_postgres; }
trap cleanup INT TERM EXIT
step() { log "── $* ──"; }

ensure_node_modules
ensure_postgres_binaries
if [ ! -x /usr/bin/chromium ]; then apt_install chromium fonts-liberation; fi
export BW_CHROMIUM=/usr/bin/chromium

step "type-check"
./node_modules/.bin/tsc --noEmit -p .
step "lint"
./node_modules/.bin/eslint .

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
port_in_use "$APP_PORT" && die "port $APP_PORT is taken; set BW_TEST_APP_PORT."
BW_DIST_DIR="$TEST_DIST" ./node_modules/.bin/next start -H 127.0.0.1 -p "$APP_PORT" >"$DATA/test-server.log" 2>&1 &
CHILD_PIDS+=($!)
for _ in $(seq 1 150); do port_in_use "$APP_PORT" && break; sleep 0.2; done
export BW_BASE_URL="http://127.0.0.1:$APP_PORT" BW_APP_PORT="$APP_PORT"

step "unit and integration tests (vitest)"
# BW_VITEST_ARGS limits vitest to some files; BW_SKIP_E2E=1 skips Playwright (both for quick local loops only).
# shellcheck disable=SC2086
./node_modules/.bin/vitest run ${BW_VITEST_ARGS:-}
if [ "${BW_SKIP_E2E:-}" = 1 ]; then log "skipping end-to-end tests (BW_SKIP_E2E=1)"; exit 0; fi
step "end-to-end tests (Playwright, Chromium)"
mkdir -p tests/artifacts
./node_modules/.bin/playwright test
log "all tests passed"
