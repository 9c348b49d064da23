// Adds up every test the test command ran (Vitest JSON reports plus single checks) into one line.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

const folder = process.argv[2];
let passed = 0;
let failed = 0;
for (const name of readdirSync(folder).sort()) {
  const report = JSON.parse(readFileSync(join(folder, name), "utf8"));
  if (name.endsWith(".vitest.json")) {
    passed += report.numPassedTests ?? 0;
    failed += report.numFailedTests ?? 0;
    // A file that fails to load has no tests in it but must still count as a failure.
    failed += (report.testResults ?? []).filter((file) => file.status === "failed" && file.assertionResults?.length === 0).length;
  } else {
    passed += report.passed;
    failed += report.failed;
  }
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
