// Improving a check order by swapping neighbours. The ratio rule (P(find) / cost, best first) is
// optimal only when each check tests one cause perfectly (Kadane & Simon 1977); with checks that
// bear on several causes, or find them only sometimes, a neighbour swap can lower the expected
// cost. Swapping the checks at steps i and i+1 changes only those two steps' terms:
//   before: C_a·R + C_b·R_a      after: C_b·R + C_a·R_b
// where R = P(the plan reaches step i) and R_x = P(it reaches step i and check x finds nothing),
// so each pass over the order costs O(H + Σ bearings), like one expected-cost pass.
import type { CheckLeaves } from "./check-leaves";
import { Survival } from "./expected-cost";
import type { ModelIndex } from "./model-index";

/** Swaps count only when they save more than this share of the step's cost: floating noise is no saving. */
const MIN_GAIN = 1e-12;

/**
 * Adjacent-swap passes over the first `window` steps of `order` (changed in place) until a pass
 * swaps nothing or `maxPasses` is reached. The head of a plan is where the order matters: later
 * steps are reached only if everything before them failed to find the fault (the unlisted share,
 * which no check finds, pays for every step in any order). Every swap lowers the expected cost, so
 * the result is never worse than the start. Returns the number of swaps made.
 */
export function improveBySwaps(
  index: ModelIndex,
  cl: CheckLeaves,
  prob: Float64Array,
  order: Int32Array,
  maxPasses: number,
  window = order.length,
): number {
  let swaps = 0;
  const end = Math.min(order.length, window);
  for (let pass = 0; pass < maxPasses; pass++) {
    const s = new Survival(prob);
    let swapped = false;
    for (let i = 0; i + 1 < end; i++) {
      const a = order[i];
      const b = order[i + 1];
      const r = s.reach();
      const ca = index.cost[a];
      const cb = index.cost[b];
      const keep = ca * r + cb * s.afterCheck(cl, a);
      const swap = cb * r + ca * s.afterCheck(cl, b);
      if (swap < keep - MIN_GAIN * (ca + cb)) {
        order[i] = b;
        order[i + 1] = a;
        swapped = true;
        swaps++;
      }
      s.advance(cl, order[i]);
    }
    if (!swapped) break;
  }
  return swaps;
}
