# Shared by scripts/start.sh and scripts/test.sh: install what is missing, start and stop
# the private services. Every service listens on 127.0.0.1 only.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
DATA_DIR="${FITFRAME_DATA_DIR:-$ROOT/data}"
PGBIN="${PGBIN:-/usr/lib/postgresql/15/bin}"
PIDS=()

log() { printf '\033[1m[fitframe]\033[0m %s\n' "$*"; }

ensure_debian_packages() {
  local missing=()
  command -v ffmpeg >/dev/null && command -v ffprobe >/dev/null || missing+=(ffmpeg)
  command -v chromium >/dev/null || missing+=(chromium)
  [ -x "$PGBIN/initdb" ] || missing+=(postgresql)
  command -v runuser >/dev/null || missing+=(util-linux)
  command -v pdftotext >/dev/null || missing+=(poppler-utils)
  if [ ${#missing[@]} -gt 0 ]; then
    log "installing Debian packages: ${missing[*]}"
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
  fi
  PGBIN="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)"
}

# Installs when package-lock.json changed since the last install (by content, not by date:
# a fresh checkout has new dates and an identical lock).
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.fitframe-lock.sha256" want
  want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
  if [ ! -d "$ROOT/node_modules" ] || [ "$(cat "$stamp" 2>/dev/null)" != "$want" ]; then
    log "npm ci"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$stamp"
  fi
}

# A private cluster owned by the postgres system user (PostgreSQL refuses to run as root).
start_postgres() {
  local port="$1" pgdata="$DATA_DIR/pg" sock="$DATA_DIR/pgsock"
  mkdir -p "$DATA_DIR"
  chmod 755 "$DATA_DIR"
  if [ ! -s "$pgdata/PG_VERSION" ]; then
    log "creating PostgreSQL cluster in $pgdata"
    mkdir -p "$pgdata" "$sock"
    chown postgres:postgres "$pgdata" "$sock"
    chmod 700 "$pgdata"
    local pw; pw="$(mktemp)"; head -c 24 /dev/urandom | base64 > "$pw"; chown postgres "$pw"
    runuser -u postgres -- "$PGBIN/initdb" -D "$pgdata" -U postgres --auth-local=trust \
      --auth-host=scram-sha-256 --pwfile="$pw" -E UTF8 --locale=C.UTF-8 >/dev/null
    rm -f "$pw"
  fi
  mkdir -p "$sock"; chown postgres:postgres "$sock"
  touch "$DATA_DIR/postgres.log"; chown postgres "$DATA_DIR/postgres.log"
  if runuser -u postgres -- "$PGBIN/pg_ctl" -D "$pgdata" status >/dev/null 2>&1; then
    log "PostgreSQL already running"
  else
    refuse_taken_port "$port" postgres
    runuser -u postgres -- "$PGBIN/pg_ctl" -D "$pgdata" -l "$DATA_DIR/postgres.log" \
      -o "-p $port -c listen_addresses=127.0.0.1 -k $sock" -w start >/dev/null
    log "PostgreSQL on 127.0.0.1:$port"
  fi
  PG_STARTED_BY_US=1
}

stop_postgres() {
  runuser -u postgres -- "$PGBIN/pg_ctl" -D "$DATA_DIR/pg" -m fast -w stop >/dev/null 2>&1 || true
}

# Creates the app role (password from DATABASE_URL) and database if missing; idempotent.
ensure_database() {
  local port="$1" url="$2"
  local user pass db
  user="$(node -e 'const u=new URL(process.argv[1]);console.log(decodeURIComponent(u.username))' "$url")"
  pass="$(node -e 'const u=new URL(process.argv[1]);console.log(decodeURIComponent(u.password))' "$url")"
  db="$(node -e 'const u=new URL(process.argv[1]);console.log(u.pathname.slice(1))' "$url")"
  local psql=(runuser -u postgres -- psql -h "$DATA_DIR/pgsock" -p "$port" -U postgres -v ON_ERROR_STOP=1 -qtA)
  if [ -z "$("${psql[@]}" -c "select 1 from pg_roles where rolname='$user'")" ]; then
    "${psql[@]}" -c "create role \"$user\" login password '$pass'" >/dev/null
  fi
  if [ -z "$("${psql[@]}" -c "select 1 from pg_database where datname='$db'")" ]; then
    "${psql[@]}" -c "create database \"$db\" owner \"$user\"" >/dev/null
    log "created database $db"
  fi
}

drop_database() {
  local port="$1" db="$2"
  runuser -u postgres -- psql -h "$DATA_DIR/pgsock" -p "$port" -U postgres -qtA \
    -c "drop database if exists \"$db\" with (force)" >/dev/null 2>&1 || true
}

# Starts a child in the background and remembers it for stop_children.
spawn() {
  local name="$1"; shift
  "$@" >"$DATA_DIR/$name.log" 2>&1 &
  PIDS+=("$!")
  echo "$!" >"$DATA_DIR/$name.pid"
}

# Refuses to start a service on a port something else already holds: talking to another stack's
# service (npm start's beside npm test's) would give wrong answers instead of an error.
refuse_taken_port() {
  local port="$1" name="$2"
  if node -e 'const s=require("net").connect(+process.argv[1],"127.0.0.1");s.on("connect",()=>process.exit(0));s.on("error",()=>process.exit(1))' "$port"; then
    log "port $port (for $name) is already in use by another program; stop it or choose another slot (FITFRAME_TEST_SLOT)"
    exit 1
  fi
}

wait_for_port() {
  local port="$1" name="$2" tries=0
  until node -e 'const s=require("net").connect(+process.argv[1],"127.0.0.1");s.on("connect",()=>process.exit(0));s.on("error",()=>process.exit(1))' "$port"; do
    tries=$((tries + 1))
    if [ $tries -gt 600 ]; then log "$name did not start; see $DATA_DIR/$name.log"; tail -20 "$DATA_DIR/$name.log" || true; return 1; fi
    sleep 0.1
  done
}

stop_children() {
  local pid
  for pid in "${PIDS[@]:-}"; do [ -n "$pid" ] && kill -TERM "$pid" 2>/dev/null || true; done
  for pid in "${PIDS[@]:-}"; do [ -n "$pid" ] && wait "$pid" 2>/dev/null || true; done
  PIDS=()
}

start_object_store() {
  local port="$1" bucket="$2" origin="$3"
  mkdir -p "$DATA_DIR/s3"
  sed "s#__ORIGIN__#$origin#" "$ROOT/scripts/lib/s3-cors.xml" > "$DATA_DIR/s3-cors.xml"
  refuse_taken_port "$port" s3
  spawn s3 node "$ROOT/node_modules/s3rver/bin/s3rver.js" -d "$DATA_DIR/s3" -a 127.0.0.1 -p "$port" \
    --configure-bucket "$bucket" "$DATA_DIR/s3-cors.xml"
  wait_for_port "$port" s3
  log "S3 fake on 127.0.0.1:$port (bucket $bucket)"
}

start_mail_catcher() {
  refuse_taken_port "$SMTP_PORT" "mail (SMTP)"
  refuse_taken_port "$MAIL_HTTP_PORT" mail
  spawn mail node --import tsx "$ROOT/scripts/mail-catcher.ts"
  wait_for_port "$MAIL_HTTP_PORT" mail
  log "mail catcher: SMTP 127.0.0.1:$SMTP_PORT, messages at http://127.0.0.1:$MAIL_HTTP_PORT/messages"
}

# The payment provider's local fake (scripts/payments-fake.ts); the app's Stripe SDK points here.
start_payments_fake() {
  export PAYMENTS_PORT="${PAYMENTS_PORT:-4242}"
  export STRIPE_API_PORT="${STRIPE_API_PORT:-$PAYMENTS_PORT}"
  refuse_taken_port "$PAYMENTS_PORT" payments
  spawn payments node --import tsx "$ROOT/scripts/payments-fake.ts"
  wait_for_port "$PAYMENTS_PORT" payments
  log "payments fake on 127.0.0.1:$PAYMENTS_PORT"
}

load_env() {
  local file="$1"
  set -a; # shellcheck disable=SC1090
  . "$file"; set +a
}
