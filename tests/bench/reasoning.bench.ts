// Benchmark of the reasoning core on generated knowledge bases at 1×, 2× and 4× the reference
// size (2,000 causes, 10,000 symptom links, 3,000 checks, 20 pieces of evidence), beside the
// straightforward reference implementation. Plain script: npx tsx tests/bench/reasoning.bench.ts
import { compileModel, diagnose, planChecks, rankCauses } from "../../app/reasoning";
import { generateCase } from "../unit/reasoning/reference/generate";
import { naiveDiagnose } from "../unit/reasoning/reference/naive";

const BASE = { causes: 2000, links: 10_000, checks: 3000, evidence: 20 };
const SCALES = [1, 2, 4];
const BUDGET_MS = 52_000; // the whole run stays under a minute
const FAST_MS = 1000; // time cap per fast measurement
let sink = 0; // results feed this so no call can be optimised away

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

// Warm up (JIT), then sample until `runs` samples or `maxMs`, whichever comes first (at least 1).
function measure(
  fn: () => number,
  warmup: number,
  runs: number,
  maxMs: number,
): { ms: number; runs: number } {
  for (let i = 0; i < warmup; i++) sink += fn();
  const times: number[] = [];
  const start = performance.now();
  while (times.length < runs && (times.length === 0 || performance.now() - start < maxMs)) {
    const t0 = performance.now();
    sink += fn();
    times.push(performance.now() - t0);
  }
  return { ms: median(times), runs: times.length };
}

const LINKS_SWEEP_MS = 12_000; // kept back for the links-only and checks-only sweeps at the end
const began = performance.now();
type Row = Record<string, string>;
const rows: Row[] = [];
const growth: { scale: number; rankPlan: number; compile: number }[] = [];
for (const [i, scale] of SCALES.entries()) {
  const size = {
    causes: BASE.causes * scale,
    links: BASE.links * scale,
    checks: BASE.checks * scale,
    evidence: BASE.evidence,
  };
  const { model, evidence } = generateCase(size, 2024 + scale);
  // First use also builds the per-model orders (costs, base rates), so time compile + that.
  const compileOnce = () => {
    const c = compileModel(model);
    c.checkLeaves();
    c.costOrder();
    c.priorOrder();
    return c;
  };
  const compiled = compileOnce();
  const compile = measure(() => (compileOnce(), 1), 5, 100, FAST_MS);
  const rankPlan = measure(
    () => rankCauses(compiled, evidence).causes.length + planChecks(compiled, evidence).steps.length,
    50,
    500,
    FAST_MS,
  );
  const both = measure(() => diagnose(compiled, evidence).plan.steps.length, 50, 500, FAST_MS);
  const why = measure(
    () => {
      const r = rankCauses(compiled, evidence);
      return r.causes.slice(0, 10).reduce((s, c) => s + Object.keys(c.contributions).length, 0);
    },
    20,
    300,
    FAST_MS,
  );
  // Everything the reference does, from a plain Model: compile, rank, plan, every contribution.
  const full = measure(
    () => {
      const { ranking, plan } = diagnose(model, evidence);
      return ranking.causes.reduce((s, c) => s + Object.keys(c.contributions).length, 0) + plan.steps.length;
    },
    5,
    100,
    FAST_MS,
  );
  // The reference is slow at 4× (seconds per run): it gets what is left of the budget, shared out.
  const left = BUDGET_MS - LINKS_SWEEP_MS - (performance.now() - began);
  const naive = measure(
    () => naiveDiagnose(model, evidence).steps.length,
    i === 0 ? 1 : 0,
    5,
    left / (2 * (SCALES.length - i)),
  );
  growth.push({ scale, rankPlan: rankPlan.ms, compile: compile.ms });
  rows.push({
    size: `${scale}×`,
    causes: `${size.causes}`,
    links: `${size.links}`,
    checks: `${size.checks}`,
    "compile ms": compile.ms.toFixed(2),
    "rank+plan ms": rankPlan.ms.toFixed(3),
    "diagnose ms": both.ms.toFixed(3),
    "rank+why top10 ms": why.ms.toFixed(3),
    "full from Model ms": full.ms.toFixed(2),
    "reference ms": naive.ms.toFixed(0),
    "ref/full": (naive.ms / full.ms).toFixed(0),
    "runs (r+p/ref)": `${rankPlan.runs}/${naive.runs}`,
  });
}

const head = Object.keys(rows[0]);
const widths = head.map((h) => Math.max(h.length, ...rows.map((r) => r[h].length)));
const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i])).join("  ");
console.log(
  `Reasoning core: medians in ms (Node ${process.version}; ${BASE.evidence} pieces of evidence, 70% observations, half by owners)`,
);
console.log("  rank+plan  = rankCauses + planChecks on a compiled model (contributions not read)");
console.log("  diagnose   = both answers from one call on a compiled model");
console.log(
  "  full       = diagnose(plain Model): compile + rank + plan + every cause's contributions, as the reference does",
);
console.log(line(head));
for (const r of rows) console.log(line(head.map((h) => r[h])));
const rel = (k: "rankPlan" | "compile") => growth.map((g) => (g[k] / growth[0][k]).toFixed(2)).join(" / ");
console.log(
  `growth vs 1× (linear = ${SCALES.join(" / ")}): rank+plan ${rel("rankPlan")}; compile ${rel("compile")}`,
);

// Links only: same causes, checks and evidence, 1×, 2×, 4× the symptom links. Links are read
// when compiling (and so on every call given a plain Model); a compiled model's rank + plan only
// touches the links of the observed symptoms.
console.log(`\nLinks only (${BASE.causes} causes, ${BASE.checks} checks; medians in ms)`);
const linkRows: string[][] = [];
for (const scale of SCALES) {
  const { model, evidence } = generateCase({ ...BASE, links: BASE.links * scale }, 99);
  const compiled = compileModel(model);
  const compile = measure(() => (compileModel(model), 1), 5, 100, 800);
  const perCall = measure(() => diagnose(model, evidence).plan.steps.length, 5, 100, 800);
  const rankPlan = measure(
    () => rankCauses(compiled, evidence).causes.length + planChecks(compiled, evidence).steps.length,
    30,
    300,
    800,
  );
  linkRows.push([
    `${BASE.links * scale}`,
    compile.ms.toFixed(2),
    perCall.ms.toFixed(2),
    rankPlan.ms.toFixed(3),
  ]);
}
const linkHead = ["links", "compile ms", "diagnose(Model) ms", "rank+plan (compiled) ms"];
const lw = linkHead.map((h, i) => Math.max(h.length, ...linkRows.map((r) => r[i].length)));
console.log(linkHead.map((h, i) => h.padStart(lw[i])).join("  "));
for (const r of linkRows) console.log(r.map((c, i) => c.padStart(lw[i])).join("  "));

// Checks only: the plan's share, with causes and links fixed, to separate its growth from the
// garbage collection and cache effects that the full-size rows above also contain.
const checkCells: string[] = [];
for (const scale of SCALES) {
  const { model, evidence } = generateCase({ ...BASE, checks: BASE.checks * scale }, 7);
  const compiled = compileModel(model);
  checkCells.push(
    `${BASE.checks * scale} checks ${measure(() => planChecks(compiled, evidence).steps.length, 30, 300, 800).ms.toFixed(3)}`,
  );
}
console.log(
  `\nplanChecks alone (compiled; ${BASE.causes} causes, ${BASE.links} links), median ms: ${checkCells.join(" | ")}`,
);
console.log(`total ${((performance.now() - began) / 1000).toFixed(1)} s${sink === -1 ? "" : ""}`);
