#!/usr/bin/env bash
# The whole suite: Node.js version, ESLint, tsc, astro check, build, unit + API tests (vitest), browser tests
# (Playwright in Debian's Chromium). Ends with one line "N passed, N failed": every vitest and Playwright test
# counts once, and so does each check stage (lint, types, astro check, build, the browser check).
# COILWRIGHT_STAGES="lint types astro build vitest browser" (the default) picks stages to run.
set -u
cd "$(dirname "$0")/.."
export ASTRO_TELEMETRY_DISABLED=1
node scripts/check-node.mjs || { echo "0 passed, 1 failed"; exit 1; }

stages=" ${COILWRIGHT_STAGES:-lint types astro build vitest browser} "
wants() { [[ "$stages" == *" $1 "* ]]; }
mkdir -p test-results
# results of an earlier run never count: remove the reports of the stages about to run
wants vitest && rm -f test-results/vitest.json
wants browser && rm -f "${PW_JSON:-test-results/playwright.json}"
stage_passed=0
stage_failed=0
browser_ran=0

# stage NAME LOG COMMAND...: runs a check that must end with exit status 0; prints its log tail or, on failure, all of it.
stage() {
  local name=$1 log=$2
  shift 2
  echo "== $name"
  if "$@" > "$log" 2>&1; then
    stage_passed=$((stage_passed + 1))
    tail -n 3 "$log"
    return 0
  fi
  stage_failed=$((stage_failed + 1))
  cat "$log"
  echo "-- $name failed"
  return 1
}

wants lint && stage "lint (eslint .)" test-results/eslint.log node node_modules/eslint/bin/eslint.js . --max-warnings 0
wants types && stage "types (tsc --noEmit)" test-results/tsc.log node node_modules/typescript/bin/tsc --noEmit
wants astro && stage "astro check" test-results/astro-check.log node node_modules/astro/astro.js check

built=1
if wants build; then
  stage "build (astro build)" test-results/build.log node node_modules/astro/astro.js build || built=0
fi

if wants vitest; then
  echo "== unit and API tests (vitest)"
  if [ "$built" = 1 ]; then
    node node_modules/vitest/vitest.mjs run --reporter=default --reporter=json --outputFile.json=test-results/vitest.json
  else
    echo "-- skipped: no build (counted as failed)"
  fi
fi

if wants browser; then
  echo "== browser check"
  if [ "$built" = 1 ] && node scripts/check-browser.mjs; then
    stage_passed=$((stage_passed + 1))
    browser_ran=1
    echo "== browser tests (Playwright, Debian Chromium)"
    node node_modules/@playwright/test/cli.js test
  else
    stage_failed=$((stage_failed + 1))
    echo "-- browser tests skipped (counted as failed)"
  fi
fi

counts=$(STAGES="$stages" BROWSER_RAN=$browser_ran STAGE_PASSED=$stage_passed STAGE_FAILED=$stage_failed node -e '
const fs = require("fs");
const stages = process.env.STAGES;
let p = Number(process.env.STAGE_PASSED), f = Number(process.env.STAGE_FAILED);
if (stages.includes(" vitest ")) {
  try { const v = JSON.parse(fs.readFileSync("test-results/vitest.json", "utf8")); p += v.numPassedTests; f += v.numFailedTests + (v.numRuntimeErrorTestSuites || 0); } catch { f += 1; }
}
if (process.env.BROWSER_RAN === "1") {
  try { const w = JSON.parse(fs.readFileSync(process.env.PW_JSON || "test-results/playwright.json", "utf8")); p += w.stats.expected + (w.stats.flaky || 0); f += w.stats.unexpected + (w.errors?.length ? 1 : 0); } catch { f += 1; }
}
console.log(p + " passed, " + f + " failed");
')
echo "$counts"
case "$counts" in *", 0 failed") exit 0 ;; *) exit 1 ;; esac
