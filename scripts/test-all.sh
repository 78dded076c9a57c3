#!/usr/bin/env bash
# The whole suite: build, unit + API tests (vitest), browser tests (Playwright in Debian's Chromium).
# Ends with one line "N passed, N failed" counting every suite.
set -u
cd "$(dirname "$0")/.."
export ASTRO_TELEMETRY_DISABLED=1
mkdir -p test-results
status=0

echo "== build"
node node_modules/astro/astro.js build > test-results/build.log 2>&1 || { cat test-results/build.log; echo "0 passed, 1 failed"; exit 1; }
tail -n 3 test-results/build.log

echo "== unit and API tests (vitest)"
node node_modules/vitest/vitest.mjs run --reporter=default --reporter=json --outputFile.json=test-results/vitest.json || status=1

echo "== browser tests (Playwright, Debian Chromium)"
node node_modules/@playwright/test/cli.js test || status=1

counts=$(node -e '
const fs = require("fs");
let p = 0, f = 0;
try { const v = JSON.parse(fs.readFileSync("test-results/vitest.json", "utf8")); p += v.numPassedTests; f += v.numFailedTests + (v.numRuntimeErrorTestSuites || 0); } catch { f += 1; }
try { const w = JSON.parse(fs.readFileSync("test-results/playwright.json", "utf8")); p += w.stats.expected + (w.stats.flaky || 0); f += w.stats.unexpected + (w.errors?.length ? 1 : 0); } catch { f += 1; }
console.log(p + " passed, " + f + " failed");
')
echo "$counts"
case "$counts" in *", 0 failed") ;; *) status=1 ;; esac
exit $status
