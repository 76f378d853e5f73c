#!/usr/bin/env bash
# Starts Fitframe with demo data: PostgreSQL, the S3 fake, the mail catcher, the worker and
# the web server, all on 127.0.0.1. Ctrl-C stops everything. `--dev` runs `next dev` instead
# of a production build.
source "$(dirname "$0")/lib/common.sh"
cd "$ROOT"

DEV=0
[ "${1:-}" = "--dev" ] && DEV=1

ensure_debian_packages
ensure_node_modules
if [ ! -f .env ]; then
  sed "s#^NEXTAUTH_SECRET=.*#NEXTAUTH_SECRET=$(head -c 32 /dev/urandom | base64 | tr -d '/+=')#" .env.example > .env
  log "wrote .env from .env.example"
fi
load_env .env

cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  stop_children
  stop_postgres
  exit 0
}
trap cleanup INT TERM EXIT

start_postgres "$PG_PORT"
ensure_database "$PG_PORT" "$DATABASE_URL"
npx tsx scripts/migrate.ts
start_object_store "$(node -e 'console.log(new URL(process.argv[1]).port)' "$S3_ENDPOINT")" "$S3_BUCKET" "$NEXTAUTH_URL"
start_mail_catcher
start_payments_fake
node --conditions=react-server --import tsx scripts/seed.ts
spawn worker node --conditions=react-server --import tsx workers/index.ts
if [ $DEV = 1 ]; then
  refuse_taken_port "$WEB_PORT" web
  spawn web node node_modules/next/dist/bin/next dev -p "$WEB_PORT" -H 127.0.0.1
else
  log "building the web app"
  node node_modules/next/dist/bin/next build >"$DATA_DIR/build.log" 2>&1 || { tail -40 "$DATA_DIR/build.log"; exit 1; }
  refuse_taken_port "$WEB_PORT" web
  spawn web node node_modules/next/dist/bin/next start -p "$WEB_PORT" -H 127.0.0.1
fi
wait_for_port "$WEB_PORT" web

cat <<MSG

  Fitframe is running at $NEXTAUTH_URL

  Demo sign-ins (password: fitframe-demo)
    admin    admin@harrowgate.test
    fitter   fitter@harrowgate.test   (also fitter2@harrowgate.test)
    coach    coach@harrowgate.test
    golfer   golfer@harrowgate.test   (also golfer2@, golfer3@harrowgate.test)
  Demo API token (fitter): ff_demo_capture_token_local_only_0001
  Mail catcher: http://127.0.0.1:$MAIL_HTTP_PORT/messages
  Logs: $DATA_DIR/*.log — Ctrl-C stops everything.

MSG
wait
