#!/usr/bin/env bash
# npm run bench: every benchmark in tests/bench, one after another, figures printed side by side.
# Benchmarks are measurements, not tests: they print and never fail the build on a slow machine.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
bash scripts/ensure-deps.sh
bash scripts/ensure-chromium.sh # the case-page bench measures in Chromium
export NODE_ENV=production
for f in tests/bench/*.bench.ts; do
  echo "== $f"
  node_modules/.bin/tsx "$f"
done
