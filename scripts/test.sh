#!/usr/bin/env bash
# The whole test suite from a fresh clone: dependencies, PostgreSQL, Chromium, a production build, then
# unit + integration + e2e in one vitest run, ending with one plain "N passed, N failed" line.
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export NEXT_TELEMETRY_DISABLED=1
# The test build lives apart from the demo's, so tests never break a running demo.
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}"
mkdir -p .data

bash scripts/ensure-deps.sh || exit 1
bash scripts/pg.sh start || exit 1
bash scripts/ensure-chromium.sh || exit 1

echo "[test] building the app (log: .data/test-build.log)"
if ! npx next build >.data/test-build.log 2>&1; then
  tail -40 .data/test-build.log
  echo "0 passed, 1 failed"
  exit 1
fi

report=.data/test-report.json
rm -f "$report"
npx vitest run --reporter=default --reporter=json --outputFile.json="$report" "$@"
status=$?
node scripts/test-summary.mjs "$report"
exit $status
