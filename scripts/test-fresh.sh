#!/usr/bin/env bash
# Sets up a fresh machine for the tests and runs them all:
# Debian's chromium (browser tests) and poppler-utils (print tests), npm packages, then `npm test`.
set -euo pipefail
cd "$(dirname "$0")/.."
if ! command -v chromium >/dev/null 2>&1 || ! command -v pdftoppm >/dev/null 2>&1; then
  SUDO=""
  [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq
  $SUDO env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium poppler-utils >/dev/null
fi
npm ci --no-audit --no-fund
npm test
