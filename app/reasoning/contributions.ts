// The "why": how much each piece of evidence moved each cause, as a log likelihood ratio
//   w_i(c) = log( P(e_i | c) / P(e_i | ¬c) ),
// where ¬c is "any other hypothesis", weighted by where things stood just before e_i (the chain
// rule). With that choice the weights add up exactly:
//   log odds(c | all evidence) = log odds(c) before any evidence + Σ_i w_i(c),
// so the figures on screen always account for the probability shown. Items are taken in the order
// the evidence lists them: observations first, then findings.
import type { EvidenceItem } from "./evidence";
import type { ModelIndex } from "./model-index";
import { computePosterior } from "./posterior";

/** Contributions as a flat array: row i (one per item) holds the weight of item i for each leaf. */
export function computeContributions(index: ModelIndex, items: readonly EvidenceItem[]): Float64Array {
  const H = index.hypotheses;
  const L = index.leafCount;
  const out = new Float64Array(items.length * L);
  const pi = index.prior.slice(); // P(h | evidence so far)
  const lik = new Float64Array(H);
  const tailPL = new Float64Array(H + 1); // Σ_{j ≥ h} π_j·lik_j
  const tailP = new Float64Array(H + 1); // Σ_{j ≥ h} π_j
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    lik.fill(item.defaultLik);
    lik[L] = item.unlistedLik;
    for (let j = 0; j < item.leaves.length; j++) lik[item.leaves[j]] = item.liks[j];
    let marginal = sumTails(pi, lik, tailPL, tailP);
    if (!(marginal > 0)) {
      // Every hypothesis still weighted in probability space says "impossible"; the ones that can
      // explain it underflowed to 0 earlier. Rare: rebuild π from the log-space posterior so far.
      pi.set(computePosterior(index, items.slice(0, i)).prob);
      marginal = sumTails(pi, lik, tailPL, tailP);
    }
    // Exclusive sums Σ_{j≠h} come from head + tail sums, never by subtracting from a total, so a
    // cause at 99.99…% still gets an accurate P(e | ¬c).
    let headPL = 0;
    let headP = 0;
    const row = i * L;
    for (let h = 0; h < L; h++) {
      const others = headP + tailP[h + 1];
      const othersLik = headPL + tailPL[h + 1];
      out[row + h] = weight(lik[h], othersLik, others);
      headPL += pi[h] * lik[h];
      headP += pi[h];
    }
    if (marginal > 0) for (let h = 0; h < H; h++) pi[h] = (pi[h] * lik[h]) / marginal;
  }
  return out;
}

// log(P(e|c) / P(e|¬c)) with P(e|¬c) = othersLik / others; ±Infinity when the evidence rules c
// out (or is explained by c alone); 0 when no alternative to c is left, since nothing can move it.
function weight(likC: number, othersLik: number, others: number): number {
  if (!(others > 0)) return 0;
  if (likC === 0) return othersLik > 0 ? -Infinity : 0;
  if (!(othersLik > 0)) return Infinity;
  const ratio = (likC * others) / othersLik;
  if (ratio > 0 && ratio < Infinity) return Math.log(ratio);
  return Math.log(likC) + Math.log(others) - Math.log(othersLik);
}

function sumTails(pi: Float64Array, lik: Float64Array, tailPL: Float64Array, tailP: Float64Array): number {
  const H = pi.length;
  tailPL[H] = 0;
  tailP[H] = 0;
  for (let h = H - 1; h >= 0; h--) {
    tailPL[h] = tailPL[h + 1] + pi[h] * lik[h];
    tailP[h] = tailP[h + 1] + pi[h];
  }
  return tailPL[0];
}
