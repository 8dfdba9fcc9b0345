// Shapes the core's numbers for the screens: names, priorities, check details and the "why" in
// the technician's words. Pure.
import type { Plan, Ranking, WhatIf } from "~/reasoning";
import type { Knowledge } from "~/kb/model";
import type { KnowledgeUsed } from "./known-evidence";

import { PLAN_OPEN, SENT_CAUSES, SENT_STEPS, WHY_CAUSES } from "./shown";
import { describeRule, speedsIn } from "~/measure";
import type { UnitSystem } from "~/domain/vehicles";

// Rules are few and their words do not change: put each into words once per unit system.
const limitCache = new Map<string, string>();
function limitWords(rule: string, units: UnitSystem): string {
  const key = `${units}|${rule}`;
  let words = limitCache.get(key);
  if (words === undefined) {
    if (limitCache.size > 2000) limitCache.clear();
    limitCache.set(key, (words = describeRule(rule, units)));
  }
  return words;
}

export { WHY_CAUSES };
const WHY_ITEMS = 8; // pieces of evidence per cause
// |log likelihood ratio| below 0.05 changes the odds by under 5%: a passed check that bears on
// another system nudges every cause a hair, and listing those would hide the evidence that counts.
const WHY_MIN = 0.05;
// Steps past those offered travel without instructions; the page is smaller for it.
const DETAILED_STEPS = PLAN_OPEN;

/** One line of a cause's "why": the evidence, what was recorded, and its log likelihood ratio. */
export type WhyLine = { label: string; recorded: string; weight: number };
export type ShownCause = {
  id: string;
  name: string;
  probability: number;
  priority: string | null;
  why: WhyLine[];
};

/** What the case recorded, as the why quotes it: present or absent, passed, failed, or the reading. */
export type Recorded = {
  observations: readonly { symptomId: string; present: boolean; source: string }[];
  findings: readonly { checkId: string; result: string; reading: string | null }[];
};

function recordedWords(recorded: Recorded) {
  const said = new Map<string, string>();
  for (const o of recorded.observations)
    said.set(
      `symptom:${o.symptomId}`,
      `${o.present ? "present" : "absent"}${o.source === "owner" ? " (owner says)" : ""}`,
    );
  for (const f of recorded.findings)
    said.set(
      `check:${f.checkId}`,
      f.reading
        ? `read ${f.reading}, ${f.result === "fail" ? "outside the limit" : "within the limit"}`
        : f.result === "fail"
          ? "failed"
          : "passed",
    );
  return said;
}

// Look-ups by id, built once per loaded knowledge base (which is itself cached per version).
const lookups = new WeakMap<Knowledge, ReturnType<typeof byId>>();
function byId(kb: Knowledge) {
  return {
    cause: new Map(kb.causes.map((c) => [c.id, c])),
    symptom: new Map(kb.symptoms.map((s) => [s.id, s])),
    check: new Map(kb.checks.map((k) => [k.id, k])),
  };
}

export function presentDiagnosis(
  kb: Knowledge,
  ranking: Ranking,
  plan: Plan,
  recorded: Recorded,
  units: UnitSystem,
) {
  let maps = lookups.get(kb);
  if (!maps) lookups.set(kb, (maps = byId(kb)));
  const { cause, symptom, check } = maps;
  const label = (key: string) => {
    const [kind, id] = [key.slice(0, key.indexOf(":")), key.slice(key.indexOf(":") + 1)];
    return kind === "symptom" ? (symptom.get(id)?.name ?? id) : (check.get(id)?.name ?? id);
  };
  const said = recordedWords(recorded);
  // The "why" is read for the causes a person looks at: the top ones, their strongest few pieces of
  // evidence. All of it for every cause would be causes × evidence numbers on every re-rank.
  const causes: ShownCause[] = ranking.causes.slice(0, SENT_CAUSES).map((c, i) => ({
    id: c.id,
    name: cause.get(c.id)?.name ?? c.id,
    probability: c.probability,
    priority: cause.get(c.id)?.priority ?? null,
    why:
      i < WHY_CAUSES
        ? Object.entries(c.contributions)
            .filter(([, w]) => Number.isFinite(w) && Math.abs(w) >= WHY_MIN)
            .map(([k, w]) => ({ label: label(k), recorded: said.get(k) ?? "", weight: w }))
            .sort((a, b) => Math.abs(b.weight) - Math.abs(a.weight))
            .slice(0, WHY_ITEMS)
        : [],
  }));
  const name = (id: string | null) => (id ? (cause.get(id)?.name ?? id) : "Not in the knowledge base");
  const outcome = (o: WhatIf["ifFail"]) =>
    o ? { topCause: name(o.topCauseId), probability: o.probability } : null;
  // Full instructions only for the steps the screen opens; the rest carry what the folded list shows.
  const step = <T extends { checkId: string; pFind: number; cost: number; skill: string }>(
    s: T,
    i: number,
  ) => {
    const k = check.get(s.checkId);
    // Cautions, tools and access always travel: any step may end up on the screen. A measured
    // check's limit is put in words here, in the workshop's units, so the browser needs no unit library.
    // Only what the screen shows: the plan's ratio and reach stay with the reasoning core.
    const shown = {
      checkId: s.checkId,
      pFind: s.pFind,
      cost: s.cost,
      skill: s.skill,
      ...("before" in s ? { before: s.before as number } : {}),
      name: k?.name ?? s.checkId,
      minutes: k?.minutes ?? 0,
      tools: k?.tools ?? [],
      access: k?.access ?? [],
      cautions: k?.cautions ?? [],
      resultKind: k?.resultKind ?? "pass_fail",
      unit: k?.unit ?? null,
      limit: k?.rule ? limitWords(k.rule, units) : null,
    };
    // Past the first few, the steps travel without their instructions (the screen fetches them
    // when such a check is opened): `detailed` says which.
    if (i >= DETAILED_STEPS)
      return { ...shown, detailed: false, instructions: [] as string[], failMeans: "" };
    return {
      ...shown,
      detailed: true,
      // Road speeds in the steps are read in the workshop's units.
      instructions: (k?.instructions ?? []).map((line) => speedsIn(line, units)),
      failMeans: speedsIn(k?.failMeans ?? "", units),
    };
  };
  const whatIfFor = (w: WhatIf | null) =>
    w ? { checkId: w.checkId, pFail: w.pFail, ifFail: outcome(w.ifFail), ifPass: outcome(w.ifPass) } : null;
  const rest = ranking.causes.slice(SENT_CAUSES);
  return {
    causes,
    // What the causes not sent add up to, so the shares on screen still account for everything.
    otherCauses: { count: rest.length, probability: rest.reduce((sum, c) => sum + c.probability, 0) },
    unlisted: ranking.unlisted,
    plan: {
      steps: plan.steps.slice(0, SENT_STEPS).map(step),
      moreSteps: Math.max(0, plan.steps.length - SENT_STEPS),
      aboveSkill: plan.aboveSkill.map(step),
      expectedCost: plan.expectedCost,
      cheapestFirstExpectedCost: plan.cheapestFirstExpectedCost,
      saving: plan.saving,
      whatIf: whatIfFor(plan.next),
    },
  };
}

/** What the case screens get: the presented ranking, and which knowledge-base version ranked it. */
export type Diagnosis = ReturnType<typeof presentDiagnosis> & { knowledge: KnowledgeUsed };
