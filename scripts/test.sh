#!/usr/bin/env bash
# The whole test suite: the README's `npm test`. Lint, type checks, unit and
# integration tests against a private PostgreSQL, reference checks against GNU
# binutils and QEMU, and the browser tests in Debian's Chromium.
set -euo pipefail
cd "$(dirname "$0")/.."

step() { printf '\n== %s\n' "$*"; }

step "Debian tools (PostgreSQL, Chromium, RISC-V binutils and QEMU, clang-16)"
if ! bash scripts/ensure-tools.sh postgres chromium riscv clang; then
  if [ "${CI:-}" = "true" ]; then echo "CI: required tools are missing" >&2; exit 1; fi
fi

step "Lint"
npx eslint .

step "Type checks"
npm run -s typecheck

step "Test database"
npx tsx scripts/db.ts test-setup
trap 'npx tsx scripts/db.ts test-teardown >/dev/null 2>&1 || true' EXIT

step "Unit, integration and reference tests (Vitest)"
npx vitest run

step "Browser tests (Playwright, Debian Chromium)"
npx vite build >/dev/null
npx playwright test
