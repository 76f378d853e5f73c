#!/usr/bin/env bash
# Runs every benchmark in scripts/bench/ against a throw-away stack (like the tests) and
# prints their figures. `bash scripts/bench.sh worker-job` runs just that one.
source "$(dirname "$0")/lib/stack.sh"
cd "$ROOT"

stack_env bench
start_stack
# Figures from a settled stack: the worker compiles and sets up its queue tables at start.
for _ in $(seq 300); do grep -q "worker ready" "$DATA_DIR/worker.log" 2>/dev/null && break; sleep 0.1; done
for bench in scripts/bench/*.ts; do
  name="$(basename "$bench" .ts)"
  [ "$name" = support ] && continue
  if [ $# -gt 0 ] && [[ ! " $* " =~ " $name " ]]; then continue; fi
  log "benchmark: $name"
  node --conditions=react-server --import tsx "$bench" || log "benchmark $name failed"
done
