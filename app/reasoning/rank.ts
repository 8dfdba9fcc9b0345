// rankCauses: the posterior over the candidate faults (leaves) plus "not in the knowledge base",
// each with its evidence contributions, and every inner node's share (the sum of its leaves).
import { computeContributions } from "./contributions";
import { resolveEvidence, type EvidenceItem } from "./evidence";
import { buildIndex, type ModelIndex } from "./model-index";
import { resolveOptions, type RankOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
import type { Evidence, Model } from "./schema";

export type RankedCause = {
  id: string;
  name?: string;
  probability: number;
  prior: number; // before any evidence, with "not in the knowledge base" taking its share
  contributions: Record<string, number>; // "symptom:<id>" / "check:<id>" -> log likelihood ratio
};

export type Ranking = {
  causes: RankedCause[]; // leaves, most likely first (ties: id order)
  unlisted: number; // P(not in the knowledge base | evidence)
  nodes: Record<string, number>; // inner node id -> sum of its leaves' probabilities
};

export function rankCauses(model: Model, evidence: Evidence, options?: RankOptions): Ranking {
  const opts = resolveOptions(options);
  const index = buildIndex(model, opts.unlistedPrior);
  const items = resolveEvidence(index, evidence, opts.ownerReliability);
  return rankFrom(index, items, computePosterior(index, items));
}

/** Shared with diagnose(): builds the ranking from an index, its evidence and its posterior. */
export function rankFrom(index: ModelIndex, items: readonly EvidenceItem[], post: Posterior): Ranking {
  const { tree, leafCount: L } = index;
  const weights = computeContributions(index, items);
  const order = leafOrder(index, post.prob);
  const causes: RankedCause[] = new Array(L);
  for (let r = 0; r < L; r++) {
    const leaf = order[r];
    const c = tree.leafCause[leaf];
    // Same key order for every cause, so the engine gives all these objects one shape.
    const contributions: Record<string, number> = {};
    for (let i = 0; i < items.length; i++) contributions[items[i].key] = weights[i * L + leaf];
    const entry: RankedCause = { id: tree.ids[c], probability: post.prob[leaf], prior: index.prior[leaf], contributions };
    if (tree.names[c] !== undefined) entry.name = tree.names[c];
    causes[r] = entry;
  }
  return { causes, unlisted: post.prob[L], nodes: nodeShares(index, post.prob) };
}

/** Leaves sorted by probability, descending; equal probabilities in id order so output is stable. */
export function leafOrder(index: ModelIndex, prob: Float64Array): Int32Array {
  const ids = index.tree.ids;
  const cause = index.tree.leafCause;
  const order = new Int32Array(index.leafCount);
  for (let i = 0; i < order.length; i++) order[i] = i;
  order.sort((a, b) => prob[b] - prob[a] || compareIds(ids[cause[a]], ids[cause[b]]));
  return order;
}

export const compareIds = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);

// Children before parents (post-order), so each node is the sum of already-summed children.
function nodeShares(index: ModelIndex, prob: Float64Array): Record<string, number> {
  const { tree } = index;
  const share = new Float64Array(tree.ids.length);
  for (let leaf = 0; leaf < index.leafCount; leaf++) share[tree.leafCause[leaf]] = prob[leaf];
  const nodes: Record<string, number> = {};
  for (const v of tree.innerPostOrder) {
    let s = 0;
    for (let j = tree.childStart[v]; j < tree.childStart[v + 1]; j++) s += share[tree.childList[j]];
    share[v] = s;
    nodes[tree.ids[v]] = s;
  }
  return nodes;
}
