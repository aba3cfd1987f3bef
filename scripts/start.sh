#!/usr/bin/env bash
# One command from a fresh clone to a running Plumbline with demo data on http://127.0.0.1:3000.
source "$(dirname "$0")/lib/bootstrap.sh"

APP_PORT="${PORT:-3000}"
APP_PID=""

cleanup() {
  trap - INT TERM EXIT
  if [ -n "$APP_PID" ] && kill -0 "$APP_PID" 2>/dev/null; then
    log "stopping the app"
    kill -TERM "$APP_PID" 2>/dev/null || true
    wait "$APP_PID" 2>/dev/null || true
  fi
  stop_embedded_pg
}
trap cleanup INT TERM EXIT

load_env_file
ensure_node_modules
bundle_entries
ensure_session_secret
if [ -n "${DATABASE_URL:-}" ]; then
  log "using the external database from DATABASE_URL"
else
  start_embedded_pg
  ensure_database plumbline
fi
run_migrations
# Server modules import "server-only", which loads only under React's server condition.
node --conditions=react-server --import tsx db/seed/demo.ts 2>"$DATA_DIR/seed.log" || { cat "$DATA_DIR/seed.log" >&2; die "demo seed failed"; }
log "building the app"
node_modules/.bin/next build >"$DATA_DIR/build.log" 2>&1 || { tail -40 "$DATA_DIR/build.log" >&2; die "build failed (log: .data/build.log)"; }

# Our server in front of Next (server/, bundled into .build/ above); it stops cleanly on TERM and INT.
PORT="$APP_PORT" NODE_ENV=production node .build/server.mjs &
APP_PID=$!
for _ in $(seq 1 60); do
  if node -e "fetch('http://127.0.0.1:$APP_PORT/api/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))"; then break; fi
  kill -0 "$APP_PID" 2>/dev/null || die "the app exited during start-up"
  sleep 0.5
done
cat "$DATA_DIR/seed.log" >&2
log "Plumbline is running: http://127.0.0.1:$APP_PORT  (Ctrl-C stops the app and the database)"
wait "$APP_PID" || true
