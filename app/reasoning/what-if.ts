// What-if: "if this check fails, the top cause becomes …; if it passes, …". Bayes' rule on the
// current posterior with the check's likelihood, without re-running the ranking:
//   P(h | e, fail) = P(h | e)·q(h) / P(fail),   P(h | e, pass) = P(h | e)·(1 − q(h)) / P(pass).
import { toCompiled, type CompiledModel } from "./compiled";
import { fail } from "./errors";
import { checkItem, resolveEvidence, type EvidenceItem } from "./evidence";
import { compareIds } from "./ids";
import type { ModelIndex } from "./model-index";
import { resolveOptions, type RankOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
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

export function whatIf(
  model: Model | CompiledModel,
  evidence: Evidence,
  checkId: string,
  options?: RankOptions,
): WhatIf {
  const opts = resolveOptions(options);
  const index = toCompiled(model).scoped(opts.unlistedPrior);
  const k = index.checkIndex.get(checkId);
  if (k === undefined)
    fail("UNKNOWN_ID", `What-if asked about check "${checkId}", which is not in the model.`);
  if (evidence?.findings?.some((f) => f.checkId === checkId)) {
    fail("ALREADY_RECORDED", `Check "${checkId}" already has a result; what-if is for checks not yet done.`);
  }
  const items = resolveEvidence(index, evidence, opts.ownerReliability, opts.unlistedSymptomRate);
  return whatIfFrom(index, computePosterior(index, items), k);
}

export function whatIfFrom(index: ModelIndex, post: Posterior, k: number): WhatIf {
  const failed = checkItem(index, k, true);
  const passed: EvidenceItem = {
    ...failed,
    defaultLik: 1 - failed.defaultLik,
    unlistedLik: 1 - failed.unlistedLik,
    liks: failed.liks.map((q) => 1 - q),
  };
  const pFail = marginal(post, failed);
  const pPass = marginal(post, passed); // summed on its own, not 1 − pFail, to stay exact near 0
  return {
    checkId: index.checkIds[k],
    pFail,
    ifFail: pFail > 0 ? outcome(index, post, failed, pFail) : null,
    ifPass: pPass > 0 ? outcome(index, post, passed, pPass) : null,
  };
}

// Σ_h P(h)·lik(h) = d + Σ_{linked leaves} P(h)·(lik(h) − d), since Σ_h P(h) = 1.
function marginal(post: Posterior, item: EvidenceItem): number {
  const U = post.prob.length - 1;
  let p = item.defaultLik + post.prob[U] * (item.unlistedLik - item.defaultLik);
  for (let j = 0; j < item.leaves.length; j++)
    p += post.prob[item.leaves[j]] * (item.liks[j] - item.defaultLik);
  return Math.min(1, Math.max(0, p));
}

// The top hypothesis after the result. Every leaf the check does not bear on is scaled by the
// same default likelihood, so among those the order is unchanged: only the best of them and the
// leaves the check bears on need comparing. Ties go to the smaller id; "not in the knowledge base"
// wins only if strictly more likely.
function outcome(index: ModelIndex, post: Posterior, item: EvidenceItem, z: number): WhatIfOutcome {
  const { tree, leafCount: L } = index;
  const idOf = (leaf: number) => tree.ids[tree.leafCause[leaf]];
  const borne = new Uint8Array(L);
  for (const leaf of item.leaves) borne[leaf] = 1;
  let top = -1;
  let topWeight = -1;
  const consider = (leaf: number, weight: number) => {
    if (weight > topWeight || (weight === topWeight && top >= 0 && compareIds(idOf(leaf), idOf(top)) < 0)) {
      top = leaf;
      topWeight = weight;
    }
  };
  let best = -1; // most likely leaf the check does not bear on
  for (let h = 0; h < L; h++) {
    if (borne[h]) continue;
    const lh = post.logPost[h];
    if (
      best < 0 ||
      lh > post.logPost[best] ||
      (lh === post.logPost[best] && compareIds(idOf(h), idOf(best)) < 0)
    )
      best = h;
  }
  if (best >= 0) consider(best, post.prob[best] * item.defaultLik);
  for (let j = 0; j < item.leaves.length; j++)
    consider(item.leaves[j], post.prob[item.leaves[j]] * item.liks[j]);
  const unlisted = (post.prob[L] * item.unlistedLik) / z;
  if (top < 0 || unlisted > topWeight / z) return { topCauseId: null, probability: unlisted, unlisted };
  return { topCauseId: idOf(top), probability: topWeight / z, unlisted };
}
