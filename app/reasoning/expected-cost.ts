// Expected cost of running checks in a given order, stopping at the first check that fails:
//   ECR = Σ_i C_i · P(every check before step i passed).
// Under the single-fault model with checks independent given the cause,
//   P(all of k_1..k_{i−1} pass) = Σ_h P(h | e) · Π_{j<i} (1 − q_j(h)),
// with q_j(h) = P(check j fails | h). For perfect single-cause checks this is the textbook
// 1 − Σ_{j<i} p_j (Heckerman, Breese & Rommelse 1995); the last step counts too.
//
// Linear time: every hypothesis a check does not bear on shrinks by the same factor (1 − false
// alarm), so that factor is kept once as G and only the leaves the check bears on are updated.
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
 * the plan calls the chance of finding the fault: a false alarm stops the search without finding
 * anything, so it must not make an unrelated cheap check look worth doing. For perfect
 * single-cause checks (no false alarms) it equals P(fail), so the ordering theorem is unchanged.
 */
export function detectProbability(cl: CheckLeaves, prob: Float64Array, k: number): number {
  let p = 0;
  for (let j = cl.start[k]; j < cl.start[k + 1]; j++) p += prob[cl.leaf[j]] * cl.pFail[j];
  return Math.min(1, Math.max(0, p));
}

export type OrderCost = { total: number; reached: Float64Array }; // reached[i] = P(step i is run)

export function expectedCost(index: ModelIndex, cl: CheckLeaves, prob: Float64Array, order: ArrayLike<number>): OrderCost {
  const t = prob.slice(); // survival of each hypothesis, relative to G
  let T = 1; // Σ t
  let G = 1;
  let total = 0;
  // The hypotheses that can still be alive: all of them until a check with false-alarm rate 1
  // (it fails unless one of its own causes is there) leaves only the leaves it bears on. Keeping
  // that set small is what bounds the cost: O(H + Σ bearings) for the whole order, never O(K·H).
  let live: Int32Array | null = null;
  const reached = new Float64Array(order.length);
  for (let s = 0; s < order.length; s++) {
    const k = order[s];
    const reach = Math.min(1, Math.max(0, G * T));
    reached[s] = reach;
    total += index.cost[k] * reach;
    const from = cl.start[k];
    const to = cl.start[k + 1];
    const g = 1 - index.falseAlarm[k];
    if (g > 0) {
      for (let j = from; j < to; j++) {
        const h = cl.leaf[j];
        const next = (t[h] * (1 - cl.pFail[j])) / g;
        T += next - t[h];
        t[h] = next;
      }
      G *= g;
      if (G < 1e-150) {
        // Fold G into t before it underflows (it shrinks by every false-alarm rate).
        T = fold(t, G, live);
        G = 1;
      }
    } else {
      // False alarm 1: only the leaves this check can pass on survive it.
      const kept = new Float64Array(to - from);
      for (let j = from; j < to; j++) kept[j - from] = t[cl.leaf[j]] * G * (1 - cl.pFail[j]);
      if (live === null) t.fill(0);
      else for (let i = 0; i < live.length; i++) t[live[i]] = 0;
      T = 0;
      for (let j = from; j < to; j++) T += t[cl.leaf[j]] = kept[j - from];
      live = cl.leaf.slice(from, to);
      G = 1;
    }
  }
  return { total, reached };
}

function fold(t: Float64Array, factor: number, live: Int32Array | null): number {
  let sum = 0;
  if (live === null) for (let h = 0; h < t.length; h++) sum += t[h] *= factor;
  else for (let i = 0; i < live.length; i++) sum += t[live[i]] *= factor;
  return sum;
}
