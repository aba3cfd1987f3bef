#!/usr/bin/env bash
# For running single test files: starts the embedded PostgreSQL (left running), makes sure the test database exists
# and is migrated, and prints the exports to use.   eval "$(bash scripts/dev-db.sh)"   then   npx vitest run FILE
source "$(dirname "$0")/lib/bootstrap.sh"
ensure_node_modules >&2
bundle_entries >&2
start_embedded_pg >&2
ensure_database plumbline_test >&2
run_migrations
secret_file="$DATA_DIR/test-session-secret"
[ -s "$secret_file" ] || (umask 077; node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))' > "$secret_file")
printf 'export DATABASE_URL=%q SESSION_SECRET=%q\n' "$DATABASE_URL" "$(cat "$secret_file")"
