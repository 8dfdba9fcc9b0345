// Shapes the core's numbers for the screens: names, priorities, check details and the "why" in
// the technician's words. Pure.
import type { Plan, Ranking, WhatIf } from "~/reasoning";
import type { Knowledge } from "./build-model";

export type ShownCause = { id: string; name: string; probability: number; priority: string | null; why: { label: string; weight: number }[] };

export function presentDiagnosis(kb: Knowledge, ranking: Ranking, plan: Plan) {
  const cause = new Map(kb.causes.map((c) => [c.id, c]));
  const symptom = new Map(kb.symptoms.map((s) => [s.id, s]));
  const check = new Map(kb.checks.map((k) => [k.id, k]));
  const label = (key: string) => {
    const [kind, id] = [key.slice(0, key.indexOf(":")), key.slice(key.indexOf(":") + 1)];
    return kind === "symptom" ? symptom.get(id)?.name ?? id : check.get(id)?.name ?? id;
  };
  const causes: ShownCause[] = ranking.causes.map((c) => ({
    id: c.id,
    name: cause.get(c.id)?.name ?? c.id,
    probability: c.probability,
    priority: cause.get(c.id)?.priority ?? null,
    why: Object.entries(c.contributions)
      .filter(([, w]) => Number.isFinite(w) && Math.abs(w) > 1e-9)
      .map(([k, w]) => ({ label: label(k), weight: w }))
      .sort((a, b) => Math.abs(b.weight) - Math.abs(a.weight)),
  }));
  const name = (id: string | null) => (id ? cause.get(id)?.name ?? id : "Not in the knowledge base");
  const outcome = (o: WhatIf["ifFail"]) => (o ? { topCause: name(o.topCauseId), probability: o.probability } : null);
  const step = <T extends { checkId: string }>(s: T) => {
    const k = check.get(s.checkId);
    return { ...s, name: k?.name ?? s.checkId, minutes: k?.minutes ?? 0, tools: k?.tools ?? [], access: k?.access ?? [], cautions: k?.cautions ?? [], instructions: k?.instructions ?? [], resultKind: k?.resultKind ?? "pass_fail", unit: k?.unit ?? null, rule: k?.rule ?? null, failMeans: k?.failMeans ?? "" };
  };
  const whatIfFor = (w: WhatIf | null) => (w ? { checkId: w.checkId, pFail: w.pFail, ifFail: outcome(w.ifFail), ifPass: outcome(w.ifPass) } : null);
  return {
    causes,
    unlisted: ranking.unlisted,
    nodes: ranking.nodes,
    plan: {
      steps: plan.steps.map(step),
      aboveSkill: plan.aboveSkill.map(step),
      expectedCost: plan.expectedCost,
      cheapestFirstExpectedCost: plan.cheapestFirstExpectedCost,
      saving: plan.saving,
      whatIf: whatIfFor(plan.next),
    },
  };
}

export type Diagnosis = ReturnType<typeof presentDiagnosis>;
