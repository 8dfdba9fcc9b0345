// The posterior over hypotheses, in log space so that hundreds of pieces of evidence do not
// underflow: log P(h | e) = log prior(h) + Σ log P(e_i | h) − log Z.
//
// Sparse: an item's default likelihood multiplies every hypothesis alike, so it cancels in the
// normalisation and is never added; only the leaves it links to are touched, with the log of
// their figure relative to the default. Cost O(hypotheses + links reached).
import { fail } from "./errors";
import type { EvidenceItem } from "./evidence";
import type { ModelIndex } from "./model-index";

export type Posterior = {
  logPost: Float64Array; // normalised: log P(h | e), −Infinity for a ruled-out hypothesis
  prob: Float64Array; // P(h | e), sums to 1
};

export function computePosterior(index: ModelIndex, items: readonly EvidenceItem[]): Posterior {
  const H = index.hypotheses;
  const U = index.leafCount; // "not in the knowledge base"
  const lp = index.logPrior.slice();
  for (const item of items) {
    const d = item.defaultLik;
    if (d > 0) {
      const ld = Math.log(d);
      // A linked leaf (and "not in the knowledge base") gets its own figure instead of the default: add the difference.
      for (let j = 0; j < item.leaves.length; j++) lp[item.leaves[j]] += Math.log(item.liks[j]) - ld;
      if (item.unlistedLik !== d) lp[U] += Math.log(item.unlistedLik) - ld;
    } else {
      // Default 0 (e.g. a symptom with leak 0): only the linked leaves (and maybe U) can explain it. Rare, so dense.
      const keep = new Uint8Array(H);
      for (let j = 0; j < item.leaves.length; j++) {
        keep[item.leaves[j]] = 1;
        lp[item.leaves[j]] += Math.log(item.liks[j]);
      }
      if (item.unlistedLik > 0) {
        keep[U] = 1;
        lp[U] += Math.log(item.unlistedLik);
      }
      for (let h = 0; h < H; h++) if (!keep[h]) lp[h] = -Infinity;
    }
  }
  return normalise(lp);
}

/** Normalise log weights in place into a posterior; refuses evidence nothing explains. */
export function normalise(lp: Float64Array): Posterior {
  const H = lp.length;
  let max = -Infinity;
  for (let h = 0; h < H; h++) if (lp[h] > max) max = lp[h];
  if (max === -Infinity) {
    fail(
      "IMPOSSIBLE_EVIDENCE",
      "No cause, listed or not, can produce this evidence; check the recorded results and the model's 0 and 1 figures.",
    );
  }
  let sum = 0;
  for (let h = 0; h < H; h++) sum += Math.exp(lp[h] - max);
  const logZ = max + Math.log(sum);
  const prob = new Float64Array(H);
  for (let h = 0; h < H; h++) {
    lp[h] = lp[h] - logZ;
    prob[h] = Math.exp(lp[h]);
  }
  return { logPost: lp, prob };
}
