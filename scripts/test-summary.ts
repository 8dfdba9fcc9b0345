// Reads vitest's JSON report and prints the per-level counts, then the one line CI reads:
// "N passed, N failed". The typecheck, lint, format and schema-drift checks count as one test each.
import { readFileSync } from "node:fs";

type Assertion = { status: string };
type FileResult = { name: string; assertionResults: Assertion[]; status: string; message?: string };

const [reportPath, typecheckFailed, driftFailed, lintFailed, formatFailed] = process.argv.slice(2);
let files: FileResult[] = [];
try {
  files = JSON.parse(readFileSync(reportPath, "utf8")).testResults ?? [];
} catch {
  console.error(`no vitest report at ${reportPath}`);
}

const levels = new Map<string, { passed: number; failed: number; skipped: number }>();
let brokenFiles = 0;
for (const f of files) {
  const level = /tests\/(unit|integration|e2e)\//.exec(f.name)?.[1] ?? "other";
  const key = level === "unit" && f.name.endsWith(".tsx") ? "dom" : level;
  const c = levels.get(key) ?? { passed: 0, failed: 0, skipped: 0 };
  for (const a of f.assertionResults) {
    if (a.status === "passed") c.passed++;
    else if (a.status === "failed") c.failed++;
    else c.skipped++;
  }
  // A file that failed to load has no assertions but must still count as a failure.
  if (f.status === "failed" && f.assertionResults.length === 0) {
    c.failed++;
    brokenFiles++;
  }
  levels.set(key, c);
}

let passed = 0;
let failed = 0;
let skipped = 0;
for (const [level, c] of [...levels].sort()) {
  console.log(
    `  ${level.padEnd(12)} ${c.passed} passed, ${c.failed} failed${c.skipped ? `, ${c.skipped} skipped` : ""}`,
  );
  passed += c.passed;
  failed += c.failed;
  skipped += c.skipped;
}
for (const [name, flag] of [
  ["typecheck", typecheckFailed],
  ["schema-drift", driftFailed],
  ["lint", lintFailed],
  ["format", formatFailed],
] as const) {
  console.log(`  ${name.padEnd(12)} ${flag === "1" ? "failed" : "passed"}`);
  if (flag === "1") failed++;
  else passed++;
}
if (brokenFiles) console.log(`  (${brokenFiles} test files failed to load)`);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed > 0 || files.length === 0 ? 1 : 0);
