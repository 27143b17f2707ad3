// Prints one closing line for the whole run, "N passed, N failed", from Vitest's JSON reports.
import { readFileSync } from "node:fs";

let passed = 0;
let failed = 0;
let pending = 0;
for (const file of process.argv.slice(2)) {
  const report = JSON.parse(readFileSync(file, "utf8"));
  passed += report.numPassedTests;
  failed += report.numFailedTests;
  pending += report.numPendingTests + (report.numTodoTests ?? 0);
}
console.log(`${passed} passed, ${failed} failed${pending ? `, ${pending} skipped` : ""}`);
process.exit(failed > 0 || pending > 0 ? 1 : 0);
