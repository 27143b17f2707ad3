#!/usr/bin/env bash
# `npm test`: every check the project has, in the order a failure is cheapest to find.
set -euo pipefail
cd "$(dirname "$0")/.."

bash scripts/ensure-test-tools.sh
echo "== typecheck"
npx react-router typegen
npx tsc
echo "== unit and integration tests"
npx vitest run
echo "== production build"
npx react-router build
echo "== end-to-end journeys (Chromium)"
npx vitest run --config vitest.e2e.config.ts
