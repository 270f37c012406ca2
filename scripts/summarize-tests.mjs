// Prints one closing line "N passed, N failed" over every vitest JSON report in a folder,
// so a run that executed no test is visible (and fails).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = process.argv[2];
let passed = 0, failed = 0, skipped = 0;
for (const file of readdirSync(dir).filter((f) => f.endsWith(".json"))) {
  const report = JSON.parse(readFileSync(join(dir, file), "utf8"));
  passed += report.numPassedTests ?? 0;
  failed += (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0) - 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
