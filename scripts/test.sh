#!/usr/bin/env bash
# `npm test`: every check the project has, in the order a failure is cheapest to find.
set -euo pipefail
cd "$(dirname "$0")/.."

bash scripts/ensure-test-tools.sh
mkdir -p test-results
echo "== typecheck"
npx react-router typegen
npx tsc
echo "== unit and integration tests"
npx vitest run --reporter=default --reporter=json --outputFile.json=test-results/unit.json
echo "== production build"
npx react-router build
echo "== end-to-end journeys (Chromium)"
npx vitest run --config vitest.e2e.config.ts --reporter=default --reporter=json --outputFile.json=test-results/e2e.json
node scripts/print-test-totals.mjs test-results/unit.json test-results/e2e.json
