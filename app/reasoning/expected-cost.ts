// Expected cost of running checks in a given order until one of them finds the fault:
//   ECR = Σ_i C_i · P(no check before step i has found the fault).
// A check finds the fault when it fails because of a fault it bears on; under the single-fault
// model with checks independent given the cause,
//   P(k_1..k_{i−1} found nothing) = Σ_h P(h | e) · Π_{j<i} (1 − d_j(h)),
// with d_j(h) = P(check j fails | h) on the leaves check j bears on and 0 elsewhere. A false alarm
// finds nothing: the technician follows it up, finds the part sound and the search goes on — the
// same reading of a false alarm as the plan's ratio rule, P(find) / cost. For perfect single-cause
// checks this is the textbook Σ C_i (1 − Σ_{j<i} p_j) (Heckerman, Breese & Rommelse 1995); the last
// step counts too, and "not in the knowledge base" (which no check finds) runs every step.
//
// Linear time: a check changes only the survival of the leaves it bears on, so the whole order
// costs O(H + Σ bearings).
import type { CheckLeaves } from "./check-leaves";
import type { ModelIndex } from "./model-index";

/** P(check k fails) = Σ_h P(h)·q_k(h): its own figure on the leaves it bears on, false alarm elsewhere. */
export function failProbability(index: ModelIndex, cl: CheckLeaves, prob: Float64Array, k: number): number {
  // = d + Σ_{borne leaves} P(h)·(q(h) − d), with d the false-alarm rate, since Σ_h P(h) = 1.
  const d = index.falseAlarm[k];
  let p = d;
  for (let j = cl.start[k]; j < cl.start[k + 1]; j++) p += prob[cl.leaf[j]] * (cl.pFail[j] - d);
  return Math.min(1, Math.max(0, p));
}

/**
 * P(the check fails because of the fault it bears on) = Σ_{borne leaves} P(h)·q(h). This is what
 * the plan calls the chance of finding the fault: a false alarm finds nothing, so it must not make
 * an unrelated cheap check look worth doing. For perfect single-cause checks (no false alarms) it
 * equals P(fail), so the ordering theorem is unchanged.
 */
export function detectProbability(cl: CheckLeaves, prob: Float64Array, k: number): number {
  let p = 0;
  for (let j = cl.start[k]; j < cl.start[k + 1]; j++) p += prob[cl.leaf[j]] * cl.pFail[j];
  return Math.min(1, Math.max(0, p));
}

/** Which hypotheses are still unfound partway through an order, and how likely that is in all. */
export class Survival {
  readonly t: Float64Array; // P(h and nothing so far has found it)
  total = 1; // Σ t: P(the plan gets this far)
  constructor(prob: Float64Array) {
    this.t = prob.slice();
    let s = 0;
    for (let h = 0; h < this.t.length; h++) s += this.t[h];
    this.total = s;
  }
  reach(): number {
    return Math.min(1, Math.max(0, this.total));
  }
  /** P(the plan gets this far and check k does not find the fault). */
  afterCheck(cl: CheckLeaves, k: number): number {
    let found = 0;
    for (let j = cl.start[k]; j < cl.start[k + 1]; j++) found += this.t[cl.leaf[j]] * cl.pFail[j];
    return Math.min(1, Math.max(0, this.total - found));
  }
  /** Run check k: the leaves it bears on survive only if it does not find them. */
  advance(cl: CheckLeaves, k: number): void {
    for (let j = cl.start[k]; j < cl.start[k + 1]; j++) {
      const h = cl.leaf[j];
      const found = this.t[h] * cl.pFail[j];
      this.t[h] -= found;
      this.total -= found;
    }
  }
}

export type OrderCost = { total: number; reached: Float64Array }; // reached[i] = P(step i is run)

export function expectedCost(
  index: ModelIndex,
  cl: CheckLeaves,
  prob: Float64Array,
  order: ArrayLike<number>,
): OrderCost {
  const s = new Survival(prob);
  let total = 0;
  const reached = new Float64Array(order.length);
  for (let i = 0; i < order.length; i++) {
    const k = order[i];
    reached[i] = s.reach();
    total += index.cost[k] * reached[i];
    s.advance(cl, k);
  }
  return { total, reached };
}
