#!/usr/bin/env bash
# Speed figures: the physics core in-process, then the register against its own database and production build.
source "$(dirname "$0")/lib/bootstrap.sh"

BENCH_PORT="${PLUMBLINE_BENCH_PORT:-3200}"
APP_PID=""
cleanup() {
  trap - INT TERM EXIT
  if [ -n "$APP_PID" ] && kill -0 "$APP_PID" 2>/dev/null; then kill -TERM "$APP_PID" 2>/dev/null || true; wait "$APP_PID" 2>/dev/null || true; fi
  stop_embedded_pg
}
trap cleanup INT TERM EXIT

load_env_file
ensure_node_modules
bundle_entries
SESSION_SECRET="$(node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))')"
export SESSION_SECRET
unset DATABASE_URL
start_embedded_pg
ensure_database plumbline_bench fresh
run_migrations

log "physics core"
node_modules/.bin/tsx bench/index.ts

export PLUMBLINE_DIST_DIR=".next-bench"
log "production build for the page timing"
node_modules/.bin/next build >"$DATA_DIR/bench-build.log" 2>&1 || { tail -40 "$DATA_DIR/bench-build.log" >&2; die "build failed"; }
# One trusted proxy hop, so the sign-in flood can arrive from many addresses as it would through a load balancer.
PORT="$BENCH_PORT" NODE_ENV=production LOG_LEVEL=warn TRUST_PROXY_HOPS=1 node .build/server.mjs >"$DATA_DIR/bench-server.log" 2>&1 &
APP_PID=$!
for _ in $(seq 1 60); do
  if node -e "fetch('http://127.0.0.1:$BENCH_PORT/api/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))"; then break; fi
  sleep 0.5
done
log "register"
BENCH_URL="http://127.0.0.1:$BENCH_PORT" node_modules/.bin/tsx --conditions=react-server bench/register.ts
log "drops and health under load"
BENCH_URL="http://127.0.0.1:$BENCH_PORT" node_modules/.bin/tsx --conditions=react-server bench/drops.ts
log "health during a sign-in flood"
BENCH_URL="http://127.0.0.1:$BENCH_PORT" node_modules/.bin/tsx --conditions=react-server bench/sign-in-flood.ts
