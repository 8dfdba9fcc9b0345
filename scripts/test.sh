#!/usr/bin/env bash
# npm test: everything the tests need, then all of them, then one line "N passed, N failed".
#   dependencies (npm ci), Debian's Chromium (apt-get when missing), a throwaway PostgreSQL
#   cluster on its own port, the production build; then typecheck, lint, format, unit, dom, integration, e2e.
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export NO_COLOR=1 FORCE_COLOR=0 CI="${CI:-}"

bash scripts/ensure-deps.sh || exit 1

bash scripts/ensure-chromium.sh || exit 1

# A cluster of its own, fsync off, wiped at the start of every run.
export RL_PG_PORT="${RL_TEST_PG_PORT:-54339}"
export RL_PG_DIR="/tmp/ramplight-test-pg-$(printf '%s' "$PWD" | sha1sum | cut -c1-10)"
export RL_PG_FAST=1 RL_PG_DB=postgres
bash scripts/pg.sh reset || exit 1
trap 'bash scripts/pg.sh stop >/dev/null 2>&1' EXIT
export TEST_PG_URL="postgres://postgres@127.0.0.1:$RL_PG_PORT/postgres"

status=0
typecheck_failed=0
echo "== typecheck"
if ! (node_modules/.bin/react-router typegen && node_modules/.bin/tsc); then typecheck_failed=1; status=1; fi

echo "== lint (ESLint) and format (Prettier)"
lint_failed=0
node_modules/.bin/eslint --config scripts/eslint.config.js . || { lint_failed=1; status=1; }
format_failed=0
node_modules/.bin/prettier --check --log-level warn . || { echo "run npm run format" >&2; format_failed=1; status=1; }

echo "== schema and migrations agree"
drift_failed=0
backup="$(mktemp -d)"; cp -r drizzle "$backup/"
node_modules/.bin/drizzle-kit generate --name drift-check >/tmp/rl-drift.log 2>&1
if ! diff -r drizzle "$backup/drizzle" >/dev/null; then
  echo "drizzle-kit generated a new migration: the schema changed without one (run npm run db:generate)" >&2
  rm -rf drizzle && cp -r "$backup/drizzle" drizzle
  drift_failed=1; status=1
fi
rm -rf "$backup"

echo "== production build"
# Into a folder of its own: a demo served by npm start from build/ keeps working meanwhile.
export RL_BUILD_DIR="$PWD/.tmp/build-test"
node_modules/.bin/react-router build >/tmp/rl-build.log 2>&1 || { cat /tmp/rl-build.log; echo "build failed" >&2; exit 1; }

echo "== test database template"
node_modules/.bin/tsx tests/setup/build-template.ts || exit 1

echo "== vitest: unit, dom, integration, e2e"
report=".tmp/vitest-report.json"
mkdir -p .tmp
node_modules/.bin/vitest run --config tests/vitest.config.ts --reporter=default --reporter=json --outputFile.json="$report" "$@" || status=1

node_modules/.bin/tsx scripts/test-summary.ts "$report" "$typecheck_failed" "$drift_failed" "$lint_failed" "$format_failed" || status=1
exit $status
