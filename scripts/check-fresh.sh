#!/usr/bin/env bash
# The fresh-clone check (`npm run check:fresh`): clones the committed HEAD into
# a temporary folder and runs the README's two commands there. The start
# command runs first, as a newcomer's would (no dist/ yet): Chromium signs in,
# loads the Bench and the demo scenarios, and opens the printed share link
# (scripts/smoke-browser.ts); then the test command. Ports and data folders differ from the
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

step "npm install && npm start (the first start), then sign in and load the Bench in Chromium"
npm install --no-audit --no-fund
# Job control on for this one job: a background job of a script without it ignores SIGINT (POSIX), so the
# Ctrl-C below never reached the app (the run waited for it forever); with it the job is its own process group.
set -m
npm start > "$work/start.log" 2>&1 &
app=$!
set +m
for _ in $(seq 1 600); do
  curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1 && break
  kill -0 $app 2>/dev/null || { cat "$work/start.log"; echo "check:fresh: npm start exited" >&2; exit 1; }
  sleep 1
done
share_url="$(grep -o 'http://[^ ]*/s/[A-Za-z0-9_-]*' "$work/start.log" | head -1 || true)"
[ -n "$share_url" ] || { cat "$work/start.log"; echo "check:fresh: npm start printed no demo share link" >&2; kill -- -$app; exit 1; }
npx tsx scripts/smoke-browser.ts "http://127.0.0.1:$PORT" "$share_url" || { kill -- -$app; exit 1; }
# Ctrl-C as a terminal sends it: to the app's whole process group.
kill -INT -- -$app; wait $app || true

step "npm install && npm test"
npm install --no-audit --no-fund && npm test

step "passed in $((SECONDS - started)) s"
