// planChecks: the checks not yet done, best value first — P(check finds the fault) / cost —
// with the plan's expected cost beside plain cheapest-first. Ordering by that ratio is optimal
// when each check tests one cause perfectly (Kadane & Simon 1977; Heckerman, Breese & Rommelse
// 1995); with imperfect checks it is the standard greedy rule. The plan is static: after each new
// finding the caller asks again and gets a fresh plan.
import { fail } from "./errors";
import { resolveEvidence } from "./evidence";
import { toCompiled, type CompiledModel } from "./compiled";
import { detectProbability, expectedCost } from "./expected-cost";
import { improveBySwaps } from "./plan-order";
import { compareIds } from "./ids";
import type { ModelIndex } from "./model-index";
import { resolveOptions, type PlanOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
import { SKILL_LEVELS, type Evidence, type Model, type Skill } from "./schema";
import { orderByKeyDesc } from "./sort-keys";
import { whatIfFrom, type WhatIf } from "./what-if";

const RATIO_TIE_BITS = 20;
/** Neighbour-swap passes over an order, over its first SWAP_WINDOW steps: a handful settle every order seen in practice. */
const SWAP_PASSES = 8;
const SWAP_WINDOW = 64;

export type PlanStep = {
  checkId: string;
  name?: string;
  pFind: number; // P(this check fails because of a fault it bears on), false alarms left out
  cost: number;
  ratio: number; // pFind / cost
  skill: Skill;
  pReached: number; // P(the plan gets this far: no earlier step found the fault)
};

export type AboveSkillStep = Omit<PlanStep, "pReached"> & {
  before: number; // it would sit before steps[before] in a plan without the skill limit
};

export type Plan = {
  steps: PlanStep[];
  expectedCost: number; // ECR of `steps` in this order
  cheapestFirstExpectedCost: number; // ECR of the same checks, cheapest first (ties: id)
  saving: number; // cheapestFirstExpectedCost − expectedCost, never below 0
  order: "value" | "cheapest-first"; // the order shown started from best value (improved by swaps) or from cheapest-first
  aboveSkill: AboveSkillStep[]; // checks that need someone more skilled than maxSkill, in value order
  next: WhatIf | null; // what-if for steps[0]
};

export function planChecks(model: Model | CompiledModel, evidence: Evidence, options?: PlanOptions): Plan {
  const opts = resolveOptions(options);
  const compiled = toCompiled(model);
  const index = compiled.scoped(opts.unlistedPrior);
  const items = resolveEvidence(index, evidence, opts.ownerReliability, opts.unlistedSymptomRate);
  return planFrom(compiled, index, evidence, computePosterior(index, items), opts.maxSkill);
}

/** Expected cost of running the given checks in exactly this order (e.g. a technician's own order). */
export function orderCost(
  model: Model | CompiledModel,
  evidence: Evidence,
  checkIds: readonly string[],
  options?: PlanOptions,
): number {
  const opts = resolveOptions(options);
  const compiled = toCompiled(model);
  const index = compiled.scoped(opts.unlistedPrior);
  const post = computePosterior(
    index,
    resolveEvidence(index, evidence, opts.ownerReliability, opts.unlistedSymptomRate),
  );
  const order = checkIds.map((id) => {
    const k = index.checkIndex.get(id);
    if (k === undefined) fail("UNKNOWN_ID", `The order names check "${id}", which is not in the model.`);
    return k;
  });
  if (new Set(order).size !== order.length) fail("INVALID_INPUT", "The order lists a check twice.");
  return expectedCost(index, compiled.checkLeaves(), post.prob, order).total;
}

export function planFrom(
  compiled: CompiledModel,
  index: ModelIndex,
  evidence: Evidence,
  post: Posterior,
  maxSkill: number,
): Plan {
  const cl = compiled.checkLeaves();
  const K = index.checkIds.length;
  const done = new Uint8Array(K);
  for (const f of evidence.findings) {
    const k = index.checkIndex.get(f.checkId);
    if (k !== undefined) done[k] = 1;
  }
  const pFind = new Float64Array(K);
  const ratio = new Float64Array(K);
  for (let k = 0; k < K; k++) {
    if (done[k]) continue;
    pFind[k] = detectProbability(cl, post.prob, k);
    ratio[k] = pFind[k] / index.cost[k]; // cost > 0 is enforced when indexing
  }
  // Best ratio first. Ratios that agree to 2^−32 (about 10 significant digits) tie, so that pairs
  // equal on paper, such as 0.3/10 and 0.6/20, tie in floating point too: cheaper first, then id.
  const { cost, checkIds: ids } = index;
  const order = orderByKeyDesc(
    ratio,
    K,
    (a, b) => cost[a] - cost[b] || compareIds(ids[a], ids[b]),
    RATIO_TIE_BITS,
  );

  const withinAll = new Int32Array(K);
  let n = 0;
  const aboveSkill: AboveSkillStep[] = [];
  for (let r = 0; r < K; r++) {
    const k = order[r];
    if (done[k]) continue;
    if (index.skill[k] <= maxSkill) withinAll[n++] = k;
    else {
      const step: AboveSkillStep = {
        checkId: ids[k],
        pFind: pFind[k],
        cost: cost[k],
        ratio: ratio[k],
        skill: SKILL_LEVELS[index.skill[k]],
        before: n,
      };
      if (index.checkNames[k] !== undefined) step.name = index.checkNames[k];
      aboveSkill.push(step);
    }
  }
  const cheapest = new Int32Array(n);
  let c = 0;
  for (const k of compiled.costOrder()) if (!done[k] && index.skill[k] <= maxSkill) cheapest[c++] = k;
  const cheapestFirstExpectedCost = expectedCost(index, cl, post.prob, cheapest).total;
  // The value order, improved by neighbour swaps where the ratio rule's assumptions do not hold.
  // Should it still cost more than cheapest-first, cheapest-first improved the same way is shown
  // instead: every swap lowers the cost, so the plan is never worse than cheapest-first.
  let within = withinAll.slice(0, n);
  improveBySwaps(index, cl, post.prob, within, SWAP_PASSES, SWAP_WINDOW);
  let ecr = expectedCost(index, cl, post.prob, within);
  let started: Plan["order"] = "value";
  if (ecr.total > cheapestFirstExpectedCost) {
    const alt = cheapest.slice();
    improveBySwaps(index, cl, post.prob, alt, SWAP_PASSES, SWAP_WINDOW);
    const altEcr = expectedCost(index, cl, post.prob, alt);
    if (altEcr.total < ecr.total) [within, ecr, started] = [alt, altEcr, "cheapest-first"];
  }
  const steps: PlanStep[] = new Array(within.length);
  for (let s = 0; s < within.length; s++) {
    const k = within[s];
    // A literal rather than a spread: building 3,000 steps by spreading costs more than the plan itself.
    const step: PlanStep = {
      checkId: ids[k],
      pFind: pFind[k],
      cost: cost[k],
      ratio: ratio[k],
      skill: SKILL_LEVELS[index.skill[k]],
      pReached: ecr.reached[s],
    };
    if (index.checkNames[k] !== undefined) step.name = index.checkNames[k];
    steps[s] = step;
  }
  return {
    steps,
    expectedCost: ecr.total,
    cheapestFirstExpectedCost,
    saving: Math.max(0, cheapestFirstExpectedCost - ecr.total),
    order: started,
    aboveSkill,
    next: within.length > 0 ? whatIfFrom(index, post, within[0]) : null,
  };
}
