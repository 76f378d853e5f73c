#!/usr/bin/env bash
# Runs every test: type-check and lint, unit tests, then integration and end-to-end tests
# against real services started here (a private PostgreSQL cluster with a fresh database
# for this run, the S3 fake, the mail catcher, the payments fake, the worker and a
# production build of the web app), all on 127.0.0.1 and on ports of their own.
#
#   bash scripts/test.sh                      everything (what CI runs)
#   bash scripts/test.sh tests/integration/x  only those integration/e2e files (no lint, no unit)
#   FITFRAME_TEST_SLOT=2 bash scripts/test.sh  a second run beside the first (other ports, folders)
source "$(dirname "$0")/lib/stack.sh"
cd "$ROOT"

stack_env test
# Short job expiry and maintenance so the killed-worker test sees its retry in seconds.
export CLIP_JOB_EXPIRE_S=30 PGBOSS_MAINTENANCE_S=2

if [ $# -eq 0 ]; then
  log "type-check and lint"
  npx tsc --noEmit -p .
  npx eslint . --max-warnings=0
  log "unit tests"
  npx vitest run --project unit
fi

start_stack
log "integration and end-to-end tests"
npx vitest run --project integration --project e2e "$@"
