// Leaves in ranking order: probability descending, ties by id. Only the leaves some evidence
// touches need sorting. Every other leaf's posterior is its prior times the same factor, so those
// keep the order of their base rates, precomputed once per compiled model, and the two sorted
// lists are merged in linear time.
import type { EvidenceItem } from "./evidence";
import { compareIds } from "./ids";
import type { ModelIndex } from "./model-index";
import { orderByKeyDesc } from "./sort-keys";

export function rankingOrder(
  index: ModelIndex,
  items: readonly EvidenceItem[],
  prob: Float64Array,
  priorOrder: Int32Array,
): Int32Array {
  const L = index.leafCount;
  const { tree } = index;
  const idOf = (leaf: number) => tree.ids[tree.leafCause[leaf]];
  const before = (a: number, b: number) =>
    prob[a] > prob[b] || (prob[a] === prob[b] && compareIds(idOf(a), idOf(b)) < 0);

  const isTouched = new Uint8Array(L);
  const touched: number[] = [];
  for (const item of items) {
    for (const leaf of item.leaves) {
      if (!isTouched[leaf]) {
        isTouched[leaf] = 1;
        touched.push(leaf);
      }
    }
  }
  const keys = new Float64Array(touched.length);
  for (let j = 0; j < touched.length; j++) keys[j] = prob[touched[j]];
  const sortedTouched = orderByKeyDesc(
    keys,
    touched.length,
    (a, b) => keys[b] - keys[a] || compareIds(idOf(touched[a]), idOf(touched[b])),
  );

  const out = new Int32Array(L);
  let t = 0;
  let u = 0;
  for (let r = 0; r < L; r++) {
    while (u < L && isTouched[priorOrder[u]]) u++;
    const a = t < touched.length ? touched[sortedTouched[t]] : -1;
    const b = u < L ? priorOrder[u] : -1;
    if (b < 0 || (a >= 0 && before(a, b))) {
      out[r] = a;
      t++;
    } else {
      out[r] = b;
      u++;
    }
  }
  // Equal probabilities from different base rates (rounding, or all ruled out): put in id order.
  let runStart = 0;
  for (let r = 1; r <= L; r++) {
    if (r < L && prob[out[r]] === prob[out[runStart]]) continue;
    if (r - runStart > 1) out.subarray(runStart, r).sort((a, b) => compareIds(idOf(a), idOf(b)));
    runStart = r;
  }
  return out;
}
