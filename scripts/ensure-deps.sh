#!/usr/bin/env bash
# Installs npm dependencies when they are missing or older than the lock file.
# Browsers are never downloaded by npm: tests use Debian's Chromium.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing npm dependencies…" >&2
  npm ci --no-audit --no-fund --loglevel=error >&2
fi
