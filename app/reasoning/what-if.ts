// What-if: "if this check fails, the top cause becomes …; if it passes, …". Bayes' rule on the
// current posterior with the check's likelihood, in log space, without re-running the ranking.
import { fail } from "./errors";
import { checkItem, resolveEvidence } from "./evidence";
import { buildIndex, type ModelIndex } from "./model-index";
import { resolveOptions, type RankOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
import { compareIds } from "./rank";
import type { Evidence, Model } from "./schema";

export type WhatIfOutcome = {
  topCauseId: string | null; // null: "not in the knowledge base" would be the most likely
  probability: number; // of that top hypothesis
  unlisted: number; // P(not in the knowledge base) after the result
};

export type WhatIf = {
  checkId: string;
  pFail: number;
  ifFail: WhatIfOutcome | null; // null when the check cannot fail (pFail = 0)
  ifPass: WhatIfOutcome | null; // null when the check cannot pass (pFail = 1)
};

export function whatIf(model: Model, evidence: Evidence, checkId: string, options?: RankOptions): WhatIf {
  const opts = resolveOptions(options);
  const index = buildIndex(model, opts.unlistedPrior);
  const k = index.checkIndex.get(checkId);
  if (k === undefined) fail("UNKNOWN_ID", `What-if asked about check "${checkId}", which is not in the model.`);
  if (evidence?.findings?.some((f) => f.checkId === checkId)) {
    fail("ALREADY_RECORDED", `Check "${checkId}" already has a result; what-if is for checks not yet done.`);
  }
  const items = resolveEvidence(index, evidence, opts.ownerReliability);
  return whatIfFrom(index, computePosterior(index, items), k);
}

export function whatIfFrom(index: ModelIndex, post: Posterior, k: number): WhatIf {
  const failed = checkItem(index, k, true);
  // P(fail) = Σ_h P(h)·q(h) = d + Σ_{borne leaves} P(h)·(q(h) − d), since Σ_h P(h) = 1.
  let pFail = failed.defaultLik;
  for (let j = 0; j < failed.leaves.length; j++) {
    pFail += post.prob[failed.leaves[j]] * (failed.liks[j] - failed.defaultLik);
  }
  pFail = Math.min(1, Math.max(0, pFail));
  return {
    checkId: index.checkIds[k],
    pFail,
    ifFail: pFail > 0 ? outcome(index, post, failed.defaultLik, failed.leaves, failed.liks) : null,
    ifPass: pFail < 1 ? outcome(index, post, 1 - failed.defaultLik, failed.leaves, failed.liks.map((q) => 1 - q)) : null,
  };
}

function outcome(index: ModelIndex, post: Posterior, d: number, leaves: Int32Array, liks: Float64Array): WhatIfOutcome | null {
  const H = index.hypotheses;
  const lw = new Float64Array(H);
  const ld = Math.log(d);
  for (let h = 0; h < H; h++) lw[h] = post.logPost[h] + ld;
  for (let j = 0; j < leaves.length; j++) lw[leaves[j]] = post.logPost[leaves[j]] + Math.log(liks[j]);
  let max = -Infinity;
  for (let h = 0; h < H; h++) if (lw[h] > max) max = lw[h];
  if (max === -Infinity) return null;
  let sum = 0;
  for (let h = 0; h < H; h++) sum += Math.exp(lw[h] - max);
  const logZ = max + Math.log(sum);
  // Top leaf: highest weight, ties in id order; "not in the knowledge base" only if strictly higher.
  const { tree } = index;
  let top = -1;
  for (let h = 0; h < index.leafCount; h++) {
    if (top < 0 || lw[h] > lw[top] || (lw[h] === lw[top] && compareIds(tree.ids[tree.leafCause[h]], tree.ids[tree.leafCause[top]]) < 0)) top = h;
  }
  const U = index.leafCount;
  const unlisted = Math.exp(lw[U] - logZ);
  if (lw[U] > lw[top]) return { topCauseId: null, probability: unlisted, unlisted };
  return { topCauseId: tree.ids[tree.leafCause[top]], probability: Math.exp(lw[top] - logZ), unlisted };
}
