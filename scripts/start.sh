#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the local service stand-ins on loopback,
# migrate, seed the demo, build if the sources changed, and serve. Ctrl-C stops what it started.
source "$(dirname "$0")/lib.sh"

APP_PORT="${PORT:-3000}"
cleanup() { trap - INT TERM EXIT; log "stopping"; stop_children; stop_postgres; }
trap cleanup INT TERM EXIT

ensure_node_modules
ensure_postgres_binaries
port_in_use "$APP_PORT" && die "port $APP_PORT is taken by another program. Stop it, or run: PORT=3100 npm start"
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

BW_DIST_DIR="$DIST" NODE_ENV=production ./node_modules/.bin/next start -H 127.0.0.1 -p "$APP_PORT" &
CHILD_PIDS+=($!)
for _ in $(seq 1 100); do port_in_use "$APP_PORT" && break; sleep 0.2; done
cat <<MSG

  Benchwright is running: $APP_URL
    PostgreSQL      127.0.0.1:$PG_PORT  (data in ${PG_DATA#$ROOT/})
    Mail catcher    SMTP 127.0.0.1:$SMTP_PORT, read caught mail at $MAIL_CATCHER_URL
    Storage fake    $S3_ENDPOINT (bucket ${S3_BUCKET:-benchwright-uploads})

  Demo accounts (password for both: sawdust-and-pine-42)
    member      robin@demo.benchwright.test
    instructor  ines@demo.benchwright.test

  Press Ctrl-C to stop everything.

MSG
wait "${CHILD_PIDS[@]}"
