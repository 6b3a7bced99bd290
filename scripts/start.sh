#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the local service stand-ins on loopback,
# migrate, seed the demo, build if the sources changed, and serve. Each service runs under
# scripts/supervise.ts (restarted with backoff if it dies); Ctrl-C stops everything within seconds.
source "$(dirname "$0")/lib.sh"

APP_PORT="${PORT:-3000}"
cleanup() { trap - INT TERM EXIT; log "stopping"; stop_supervised; log "stopped"; }
trap cleanup INT TERM EXIT

ensure_node_modules
ensure_postgres_binaries
port_in_use "$APP_PORT" && die "$(port_taken_message "$APP_PORT" "run on another port: PORT=3100 npm start")"
start_postgres
ensure_database benchwright
ensure_secret
export APP_URL="${APP_URL:-http://localhost:$APP_PORT}" NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$APP_PORT}"
./node_modules/.bin/tsx scripts/check-env.ts
migrate
seed
DIST="${BW_DIST_DIR:-.next}"
build_app "$DIST"
start_services "${BW_SMTP_PORT:-54325}" "${BW_MAIL_HTTP_PORT:-54326}" "${BW_S3_PORT:-54327}"
NODE_ENV=production start_app "$APP_PORT" "$DIST" -
cat <<MSG

  Benchwright is running: $APP_URL
    PostgreSQL      127.0.0.1:$PG_PORT  (data in ${PG_DATA#"$ROOT"/})
    Mail catcher    SMTP 127.0.0.1:$SMTP_PORT, read caught mail at $MAIL_CATCHER_URL
    Storage fake    $S3_ENDPOINT (bucket ${S3_BUCKET:-benchwright-uploads})
    Health          $APP_URL/api/health

$DEMO_NOTE

  The app, PostgreSQL and the services are restarted if they stop. Press Ctrl-C to stop everything.

MSG
# Returns when a supervisor ends (it only does so when told to stop); the trap stops the rest.
wait -n "${SUPERVISORS[@]}" || true
