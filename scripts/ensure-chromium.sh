#!/usr/bin/env bash
# Debian's Chromium for the browser tests and the benchmarks (npm never downloads a browser).
set -uo pipefail
if [ ! -x "${CHROMIUM_PATH:-/usr/bin/chromium}" ]; then
  if [ "$(id -u)" = 0 ]; then
    echo "Installing Debian's chromium for the browser tests…" >&2
    (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null) || { echo "chromium install failed" >&2; exit 1; }
  else
    echo "Chromium is missing: sudo apt-get update && sudo apt-get install -y chromium" >&2; exit 1
  fi
fi
