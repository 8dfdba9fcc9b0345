// planChecks: the checks not yet done, best value first — P(check finds the fault) / cost —
// with the plan's expected cost beside plain cheapest-first. Ordering by that ratio is optimal
// when each check tests one cause perfectly (Kadane & Simon 1977; Heckerman, Breese & Rommelse
// 1995); with imperfect checks it is the standard greedy rule. The plan is static: after each new
// finding the caller asks again and gets a fresh plan.
import { fail } from "./errors";
import { resolveEvidence } from "./evidence";
import { expandAllChecks, expectedCost, failProbability } from "./expected-cost";
import { buildIndex, type ModelIndex } from "./model-index";
import { resolveOptions, type PlanOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
import { compareIds } from "./rank";
import { SKILL_LEVELS, type Evidence, type Model, type Skill } from "./schema";
import { whatIfFrom, type WhatIf } from "./what-if";

export type PlanStep = {
  checkId: string;
  name?: string;
  pFind: number; // P(this check fails) under the current posterior
  cost: number;
  ratio: number; // pFind / cost
  skill: Skill;
  pReached: number; // P(the plan gets this far: every earlier step passed)
};

export type AboveSkillStep = Omit<PlanStep, "pReached"> & {
  before: number; // it would sit before steps[before] in a plan without the skill limit
};

export type Plan = {
  steps: PlanStep[];
  expectedCost: number; // ECR of `steps` in this order
  cheapestFirstExpectedCost: number; // ECR of the same checks, cheapest first (ties: id)
  saving: number; // cheapestFirstExpectedCost − expectedCost
  aboveSkill: AboveSkillStep[]; // checks that need someone more skilled than maxSkill, in value order
  next: WhatIf | null; // what-if for steps[0]
};

export function planChecks(model: Model, evidence: Evidence, options?: PlanOptions): Plan {
  const opts = resolveOptions(options);
  const index = buildIndex(model, opts.unlistedPrior);
  const items = resolveEvidence(index, evidence, opts.ownerReliability);
  return planFrom(index, evidence, computePosterior(index, items), opts.maxSkill);
}

/** Expected cost of running the given checks in exactly this order (e.g. a technician's own order). */
export function orderCost(model: Model, evidence: Evidence, checkIds: readonly string[], options?: PlanOptions): number {
  const opts = resolveOptions(options);
  const index = buildIndex(model, opts.unlistedPrior);
  const post = computePosterior(index, resolveEvidence(index, evidence, opts.ownerReliability));
  const order = checkIds.map((id) => {
    const k = index.checkIndex.get(id);
    if (k === undefined) fail("UNKNOWN_ID", `The order names check "${id}", which is not in the model.`);
    return k;
  });
  if (new Set(order).size !== order.length) fail("INVALID_INPUT", "The order lists a check twice.");
  return expectedCost(index, expandAllChecks(index), post.prob, order).total;
}

export function planFrom(index: ModelIndex, evidence: Evidence, post: Posterior, maxSkill: number): Plan {
  const cl = expandAllChecks(index);
  const K = index.checkIds.length;
  const done = new Uint8Array(K);
  for (const f of evidence.findings) {
    const k = index.checkIndex.get(f.checkId);
    if (k !== undefined) done[k] = 1;
  }
  const pFind = new Float64Array(K);
  const ratio = new Float64Array(K);
  const remaining: number[] = [];
  for (let k = 0; k < K; k++) {
    if (done[k]) continue;
    pFind[k] = failProbability(index, cl, post.prob, k);
    ratio[k] = pFind[k] / index.cost[k]; // cost > 0 is enforced when indexing
    remaining.push(k);
  }
  const { cost, checkIds: ids } = index;
  remaining.sort((a, b) => byValue(ratio[a], ratio[b]) || cost[a] - cost[b] || compareIds(ids[a], ids[b]));

  const within: number[] = [];
  const aboveSkill: AboveSkillStep[] = [];
  for (const k of remaining) {
    if (index.skill[k] <= maxSkill) within.push(k);
    else aboveSkill.push({ ...describe(index, k, pFind, ratio), before: within.length });
  }
  const ecr = expectedCost(index, cl, post.prob, within);
  const cheapest = [...within].sort((a, b) => cost[a] - cost[b] || compareIds(ids[a], ids[b]));
  const cheapestFirstExpectedCost = expectedCost(index, cl, post.prob, cheapest).total;
  return {
    steps: within.map((k, s) => ({ ...describe(index, k, pFind, ratio), pReached: ecr.reached[s] })),
    expectedCost: ecr.total,
    cheapestFirstExpectedCost,
    saving: cheapestFirstExpectedCost - ecr.total,
    aboveSkill,
    next: within.length > 0 ? whatIfFrom(index, post, within[0]) : null,
  };
}

// Higher ratio first. Ratios within a relative 1e-12 count as equal, so that p/c pairs equal on
// paper (0.3/10 and 0.6/20) tie in floating point too and fall to the cheaper-first rule.
function byValue(ra: number, rb: number): number {
  const scale = Math.max(Math.abs(ra), Math.abs(rb));
  return Math.abs(ra - rb) <= 1e-12 * scale ? 0 : rb - ra;
}

function describe(index: ModelIndex, k: number, pFind: Float64Array, ratio: Float64Array): Omit<PlanStep, "pReached"> {
  const step: Omit<PlanStep, "pReached"> = {
    checkId: index.checkIds[k],
    pFind: pFind[k],
    cost: index.cost[k],
    ratio: ratio[k],
    skill: SKILL_LEVELS[index.skill[k]],
  };
  if (index.checkNames[k] !== undefined) step.name = index.checkNames[k];
  return step;
}
