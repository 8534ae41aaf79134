// Sums every suite's results into the closing line CI reads: "N passed, N failed".
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = process.argv[2];
let passed = 0;
let failed = 0;
const rows = [];
for (const f of readdirSync(dir).sort()) {
  const p = join(dir, f);
  if (f.endsWith(".count.json")) {
    const r = JSON.parse(readFileSync(p, "utf8"));
    passed += r.passed;
    failed += r.failed;
    rows.push(`${r.suite}: ${r.passed} passed, ${r.failed} failed`);
  } else if (f.startsWith("vitest") && f.endsWith(".json")) {
    const r = JSON.parse(readFileSync(p, "utf8"));
    // A suite file that failed outside its tests (it did not load, or a beforeAll threw and its
    // tests were skipped) has no failed test in it: count it as one failure.
    const broken = (r.testResults ?? []).filter(
      (t) => t.status === "failed" && !(t.assertionResults ?? []).some((a) => a.status === "failed"),
    ).length;
    passed += r.numPassedTests;
    failed += r.numFailedTests + broken;
    rows.push(`${f.replace(/\.json$/, "")}: ${r.numPassedTests} passed, ${r.numFailedTests + broken} failed, ${r.numPendingTests} skipped`);
  }
}
if (!rows.some((r) => r.startsWith("vitest:"))) {
  failed += 1;
  rows.push("vitest: no results (the run did not finish)");
}
console.log("\n" + rows.join("\n"));
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
