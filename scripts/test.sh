#!/usr/bin/env bash
# Every test against a throw-away test database; the last line is "N passed, N failed".
source "$(dirname "$0")/lib/bootstrap.sh"

RESULTS="$DATA_DIR/test-results"
cleanup() { trap - INT TERM EXIT; stop_embedded_pg; }
trap cleanup INT TERM EXIT

load_env_file
ensure_node_modules
bundle_entries
if [ ! -x /usr/bin/chromium ]; then apt_install chromium; fi
SESSION_SECRET="$(node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))')"
export SESSION_SECRET
if [ -n "${TEST_DATABASE_URL:-}" ]; then
  DATABASE_URL="$TEST_DATABASE_URL"
  export DATABASE_URL
else
  unset DATABASE_URL
  start_embedded_pg
  ensure_database plumbline_test fresh
fi
export PLUMBLINE_DIST_DIR=".next-test"
rm -rf "$RESULTS"
mkdir -p "$RESULTS"

status=0
log "lint (ESLint with the Next.js rules)"
node_modules/.bin/eslint . || status=1
run_migrations
log "unit and integration tests (vitest)"
node_modules/.bin/vitest run --project unit --project integration \
  --reporter=default --reporter=json --outputFile.json="$RESULTS/vitest.json" || status=1

log "production build for the HTTP and browser tests"
if node_modules/.bin/next build >"$RESULTS/build.log" 2>&1; then
  log "HTTP tests against our server on the production build (vitest)"
  node_modules/.bin/vitest run --project http \
    --reporter=default --reporter=json --outputFile.json="$RESULTS/vitest-http.json" || status=1
  log "browser tests (Playwright, Debian Chromium)"
  PLAYWRIGHT_JSON_OUTPUT_NAME="$RESULTS/playwright.json" node_modules/.bin/playwright test --reporter=list,json || status=1
else
  tail -40 "$RESULTS/build.log" >&2
  log "build failed: browser tests not run"
  status=1
fi

node scripts/test-summary.mjs "$RESULTS" || status=1
exit "$status"
