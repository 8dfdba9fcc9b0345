#!/usr/bin/env bash
# npm start: dependencies, PostgreSQL, the fakes of hosted services, migrations, demo seed,
# then the production build served on a printed URL.   npm run dev: the same with hot reload.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
mode="${1:-}"

bash scripts/ensure-deps.sh
source scripts/demo-env.sh
bash scripts/pg.sh start
export DATABASE_URL="$(bash scripts/pg.sh url)"

if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then
  echo "Port $PORT is taken: Ramplight (or something else) is already serving there. Open $APP_URL or set PORT." >&2
  exit 1
fi

node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx seeds/run.ts

mkdir -p .data
export FAKE_MAIL_DIR="$PWD/.data/mail"
# The fakes run while the app runs and stop with it.
node_modules/.bin/tsx tests/fakes/start.ts &
fakes_pid=$!
trap 'kill "$fakes_pid" 2>/dev/null || true' EXIT INT TERM

if [ "$mode" = "--dev" ]; then
  echo "Ramplight (dev, hot reload) on $APP_URL — sign in as any demo member from the sign-in page." >&2
  node_modules/.bin/react-router dev --host "$HOST" --port "$PORT" --strictPort
else
  node_modules/.bin/react-router build >/dev/null
  echo "Ramplight is serving on $APP_URL — sign in as any demo member from the sign-in page." >&2
  NODE_ENV=production node scripts/serve.mjs
fi
