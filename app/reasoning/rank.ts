// rankCauses: the posterior over the candidate faults (leaves) plus "not in the knowledge base",
// each with its evidence contributions, and every inner node's share (the sum of its leaves).
import { toCompiled, type CompiledModel } from "./compiled";
import { computeContributions } from "./contributions";
import { resolveEvidence, type EvidenceItem } from "./evidence";
import type { ModelIndex } from "./model-index";
import { resolveOptions, type RankOptions } from "./options";
import { computePosterior, type Posterior } from "./posterior";
import type { Evidence, Model } from "./schema";
import { rankingOrder } from "./leaf-order";

// The weights for all causes come from one pass over the evidence (O(leaves × evidence)), made
// the first time any cause's contributions are read, so ranking and planning do not pay for a
// "why" nobody looks at. Shared by every cause of one ranking.
class Explanation {
  #weights: Float64Array | null = null;
  constructor(
    private readonly index: ModelIndex,
    private readonly items: readonly EvidenceItem[],
  ) {}
  of(leaf: number): Record<string, number> {
    const w = (this.#weights ??= computeContributions(this.index, this.items));
    const L = this.index.leafCount;
    const out: Record<string, number> = {};
    for (let i = 0; i < this.items.length; i++) out[this.items[i].key] = w[i * L + leaf];
    return out;
  }
}

/**
 * One candidate fault. `contributions` ("symptom:<id>" / "check:<id>" → log likelihood ratio)
 * is computed on first read and then kept; JSON.stringify includes it (toJSON), but an object
 * spread ({ ...cause }) copies only the plain fields.
 */
export class RankedCause {
  name?: string;
  readonly #leaf: number;
  readonly #explanation: Explanation;
  #contributions: Record<string, number> | null = null;
  constructor(
    readonly id: string,
    readonly probability: number,
    readonly prior: number, // before any evidence, with "not in the knowledge base" taking its share
    leaf: number,
    explanation: Explanation,
  ) {
    this.#leaf = leaf;
    this.#explanation = explanation;
  }
  get contributions(): Record<string, number> {
    return (this.#contributions ??= this.#explanation.of(this.#leaf));
  }
  toJSON() {
    const { id, name, probability, prior, contributions } = this;
    return name === undefined
      ? { id, probability, prior, contributions }
      : { id, name, probability, prior, contributions };
  }
}

export type Ranking = {
  causes: RankedCause[]; // leaves, most likely first (ties: id order)
  unlisted: number; // P(not in the knowledge base | evidence)
  nodes: Record<string, number>; // inner node id -> sum of its leaves' probabilities
};

export function rankCauses(model: Model | CompiledModel, evidence: Evidence, options?: RankOptions): Ranking {
  const opts = resolveOptions(options);
  const compiled = toCompiled(model);
  const index = compiled.scoped(opts.unlistedPrior);
  const items = resolveEvidence(index, evidence, opts.ownerReliability, opts.unlistedSymptomRate);
  return rankFrom(compiled, index, items, computePosterior(index, items));
}

/** Shared with diagnose(): builds the ranking from an index, its evidence and its posterior. */
export function rankFrom(
  compiled: CompiledModel,
  index: ModelIndex,
  items: readonly EvidenceItem[],
  post: Posterior,
): Ranking {
  const { tree, leafCount: L } = index;
  const explanation = new Explanation(index, items);
  const ids = tree.ids;
  const order = rankingOrder(index, items, post.prob, compiled.priorOrder());
  const causes: RankedCause[] = new Array(L);
  for (let r = 0; r < L; r++) {
    const leaf = order[r];
    const c = tree.leafCause[leaf];
    const entry = new RankedCause(ids[c], post.prob[leaf], index.prior[leaf], leaf, explanation);
    if (tree.names[c] !== undefined) entry.name = tree.names[c];
    causes[r] = entry;
  }
  return { causes, unlisted: post.prob[L], nodes: nodeShares(index, post.prob) };
}

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
