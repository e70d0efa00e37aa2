// Prints one plain line for all suites together from vitest's JSON report: "N passed, N failed[, N skipped]".
import { readFileSync } from "node:fs";

const file = process.argv[2];
let r;
try {
  r = JSON.parse(readFileSync(file, "utf8"));
} catch {
  console.log("0 passed, 1 failed");
  process.exit(0);
}
const skipped = (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
// A suite that failed to load has no test results but must still count as a failure.
const failedSuites = (r.testResults ?? []).filter((s) => s.status === "failed" && (s.assertionResults ?? []).length === 0).length;
const failed = (r.numFailedTests ?? 0) + failedSuites;
console.log(`${r.numPassedTests ?? 0} passed, ${failed} failed` + (skipped ? `, ${skipped} skipped` : ""));
