// Prints one closing line "N passed, N failed" counted from the runners' JSON reports.
import { readFileSync, existsSync } from "node:fs";
import path from "node:path";

const dir = process.argv[2];
const buildFailed = process.argv[3] === "1";
let passed = 0, failed = 0, skipped = 0;
const problems = [];

const vitest = path.join(dir, "vitest.json");
if (existsSync(vitest)) {
  const r = JSON.parse(readFileSync(vitest, "utf8"));
  passed += r.numPassedTests; failed += r.numFailedTests; skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  if (r.numFailedTestSuites && !r.numFailedTests) { failed += r.numFailedTestSuites; problems.push("a vitest file failed to load"); }
} else { failed += 1; problems.push("no vitest report"); }

const pw = path.join(dir, "playwright.json");
if (existsSync(pw)) {
  const s = JSON.parse(readFileSync(pw, "utf8")).stats;
  passed += s.expected + (s.flaky ?? 0); failed += s.unexpected; skipped += s.skipped ?? 0;
  const errs = JSON.parse(readFileSync(pw, "utf8")).errors ?? [];
  if (errs.length && !s.unexpected) { failed += errs.length; problems.push("Playwright reported errors outside tests"); }
} else { failed += 1; problems.push(buildFailed ? "the app did not build" : "no Playwright report"); }

for (const p of problems) console.log(`note: ${p}`);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed > 0 ? 1 : 0);
