#!/usr/bin/env bash
# The fresh-clone check (`npm run check:fresh`): clones the committed HEAD into
# a temporary folder and runs the README's two commands there, the start
# command in exit-when-healthy mode. Ports and data folders differ from the
# defaults so that a running dev cluster or app is not disturbed.
# CHECK_FRESH_KEEP=1 keeps the folder for a look afterwards.
set -euo pipefail
src="$(cd "$(dirname "$0")/.." && pwd)"
work="$(mktemp -d /tmp/chimeline-fresh.XXXXXX)"
# The postgres system user must reach the cluster folder inside the clone.
chmod 755 "$work"

export CHIMELINE_DB_PORT=54339 CHIMELINE_TEST_DB_PORT=54340 CHIMELINE_E2E_PORT=3190 PORT=3900 SMTP_SINK_PORT=2535
unset DATABASE_URL JWT_SECRET SMTP_URL E2E_BASE_URL

cleanup() {
  status=$?
  if [ -d "$work/repo/node_modules" ]; then
    (cd "$work/repo" && npx tsx scripts/db.ts stop >/dev/null 2>&1; npx tsx scripts/db.ts test-teardown >/dev/null 2>&1) || true
  fi
  if [ "${CHECK_FRESH_KEEP:-}" = "1" ]; then
    echo "check:fresh: kept $work"
  else
    # A cluster kept outside the clone (see server/db/cluster.ts) is recorded in .data/*.location.
    for record in "$work"/repo/.data/*.location; do
      [ -f "$record" ] && rm -rf "$(cat "$record")"
    done
    rm -rf "$work"
  fi
  exit $status
}
trap cleanup EXIT

step() { printf '\n== check:fresh: %s\n' "$*"; }
started=$SECONDS

step "clone $(git -C "$src" rev-parse --short HEAD) into $work/repo"
git clone -q --no-hardlinks "$src" "$work/repo"
cd "$work/repo"

step "npm install && npm test"
npm install --no-audit --no-fund && npm test

step "CHIMELINE_EXIT_WHEN_HEALTHY=1 npm install && npm start"
npm install --no-audit --no-fund && CHIMELINE_EXIT_WHEN_HEALTHY=1 npm start

step "passed in $((SECONDS - started)) s"
