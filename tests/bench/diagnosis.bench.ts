// The diagnostic benchmark: our own invented workshop cases (tests/bench/diagnosis/) run through
// Quick find, the measurement rules, the ranking and the check plan, printed beside the figures
// measured on the code before these changes (baseline.json) and the targets. A measurement, not a
// test: it prints and never fails. Run: NODE_ENV=production npx tsx tests/bench/diagnosis.bench.ts
// (--save-baseline rewrites baseline.json from this run, which only makes sense on the old code;
// --misses lists the cases that miss).
import { readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { benchCases } from "./diagnosis/index";
import { runCase, summarise, type Summary } from "./diagnosis/run";

const BASELINE = fileURLToPath(new URL("./diagnosis/baseline.json", import.meta.url));
const began = performance.now();
const outcomes = benchCases.map((c) => runCase(c));
const now = summarise(outcomes);

if (process.argv.includes("--save-baseline")) {
  writeFileSync(
    BASELINE,
    `${JSON.stringify({ note: "Figures of this benchmark before the changes, same cases.", measured: new Date().toISOString().slice(0, 10), summary: now }, null, 2)}\n`,
  );
}
let before: Summary | null = null;
try {
  before = JSON.parse(readFileSync(BASELINE, "utf8")).summary;
} catch {
  before = null;
}

type Row = [label: string, key: string, unit: "%" | "n" | "money" | "rank", target?: string];
const ROWS: Row[] = [
  ["phrase → symptom (intent and present/absent)", "phraseAccuracy", "%", "≥ 90 %"],
  ["  phrases with the right symptom but the wrong polarity", "phraseWrongPolarity", "n"],
  ['  phrases answered "no good match"', "phraseWeak", "n"],
  ["top-1, history only (listed causes)", "top1History", "%"],
  ["top-3, history only (listed causes)", "top3History", "%", "≥ 85 %"],
  ["top-1, with findings (listed causes)", "top1Findings", "%", "≥ 85 %"],
  ["top-3, with findings (listed causes)", "top3Findings", "%", "≥ 97 %"],
  ["engine alone (phrases recorded as meant): top-1, history only", "meantTop1History", "%"],
  ["engine alone: top-3, history only", "meantTop3History", "%"],
  ["engine alone: top-1, with findings", "meantTop1Findings", "%"],
  ["engine alone: top-3, with findings", "meantTop3Findings", "%"],
  ['top-1, with findings (all cases, "not in the KB" as an answer)', "allTop1Findings", "%"],
  ["top-3, with findings (all cases)", "allTop3Findings", "%"],
  ['"not in the KB" 1st or 2nd, history only (missing-cause cases)', "unlistedTop2History", "%"],
  ['"not in the KB" 1st or 2nd, with findings (missing-cause cases)', "unlistedTop2Findings", "%", "≥ 80 %"],
  ['mean rank of "not in the KB", history only (missing-cause cases)', "unlistedMeanRankHistory", "rank"],
  ['mean rank of "not in the KB", with findings (missing-cause cases)', "unlistedMeanRankFindings", "rank"],
  ['worst rank of "not in the KB", with findings (missing-cause cases)', "unlistedWorstRankFindings", "n"],
  ["mean P(not in the KB) with findings, missing-cause cases", "unlistedMeanMissing", "%"],
  ["mean P(not in the KB) with findings, listed-cause cases", "unlistedMeanListed", "%"],
  ["plan expected cost, mean per plan (see note)", "planExpected", "money"],
  ["cheapest-first expected cost, mean per plan (see note)", "planCheapest", "money"],
  ["plans whose expected cost is above cheapest-first", "planWorseThanCheapest", "n", "0"],
];
const show = (v: number | undefined, unit: Row[2]) =>
  v === undefined
    ? "–"
    : unit === "%"
      ? `${v.toFixed(1)} %`
      : unit === "money"
        ? v.toFixed(2)
        : unit === "rank"
          ? v.toFixed(1)
          : String(v);
const head = ["figure", "before", "now", "target"];
const body = ROWS.map(([label, key, unit, target]) => [
  label,
  show(before?.[key], unit),
  show(now[key], unit),
  target ?? "",
]);
const widths = head.map((h, i) => Math.max(h.length, ...body.map((r) => r[i].length)));
const line = (cells: string[]) =>
  cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join("  ");
console.log(
  `Diagnostic benchmark: ${now.cases} cases (${now.listedCases} with a listed cause, ${now.missingCases} whose cause is not in the knowledge base), ${now.phrases} phrases, ${now.plans} plans; Node ${process.version}`,
);
console.log(line(head));
for (const r of body) console.log(line(r));
const missingRanks = outcomes
  .filter((o) => !o.listed)
  .map((o) => `${o.id.replace(/^missing-/, "")} ${o.unlistedRankHistory}→${o.unlistedRankFindings}`);
console.log(
  `"not in the KB" rank per missing-cause case now (history → with findings): ${missingRanks.join(", ")}`,
);
console.log(
  "Note: the expected cost now runs until a check finds the fault (a false alarm is followed up and the search goes on); before, a false alarm ended the plan, so the two money rows measure different things. The count of plans above cheapest-first is on each side's own definition.",
);
if (process.argv.includes("--misses")) {
  for (const o of outcomes) {
    const wrong = o.phrases
      .filter((p) => !p.correct)
      .map(
        (p) =>
          `"${p.phrase.text}" → ${p.got ?? "no good match"}${p.present ? "" : " (absent)"} [meant ${p.phrase.means ?? "none"}${p.phrase.present ? "" : " absent"}]`,
      );
    if (o.rankFindings > 1 || wrong.length || (!o.listed && o.unlistedRankFindings > 2)) {
      console.log(
        `${o.id}: rank ${o.rankHistory} → ${o.rankFindings} (top ${o.topFindings}; not-in-KB rank ${o.unlistedRankFindings}, ${(100 * o.unlistedFindings).toFixed(1)} %)`,
      );
      for (const w of wrong) console.log(`    ${w}`);
    }
  }
}
console.log(`Total ${((performance.now() - began) / 1000).toFixed(1)} s.`);
