#!/usr/bin/env bash
# Runs every benchmark in scripts/bench/ against a throw-away stack (like the tests) and
# prints their figures. `bash scripts/bench.sh worker-job` runs just that one.
source "$(dirname "$0")/lib/stack.sh"
cd "$ROOT"

stack_env bench
start_stack
for bench in scripts/bench/*.ts; do
  name="$(basename "$bench" .ts)"
  [ "$name" = support ] && continue
  if [ $# -gt 0 ] && [[ ! " $* " =~ " $name " ]]; then continue; fi
  log "benchmark: $name"
  node --conditions=react-server --import tsx "$bench" || log "benchmark $name failed"
done
