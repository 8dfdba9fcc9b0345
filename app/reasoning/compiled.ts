// compileModel: validate and index a Model once, then rank, plan and ask what-if as often as
// needed. Every public function also accepts a plain Model and compiles it on the spot; compiling
// is the largest part of a call (it touches every link and check), so a server that answers
// several questions about one case should compile once. A CompiledModel is an immutable snapshot:
// later changes to the Model object do not reach it.
import { expandAllChecks, type CheckLeaves } from "./check-leaves";
import { fail } from "./errors";
import { buildIndex, priorsFor, type BaseIndex, type ModelIndex } from "./model-index";
import type { Model } from "./schema";
import { compareIds } from "./ids";
import { orderByKeyDesc } from "./sort-keys";

export class CompiledModel {
  readonly #base: BaseIndex;
  #checkLeaves: CheckLeaves | null = null;
  #costOrder: Int32Array | null = null;
  #priorOrder: Int32Array | null = null;
  #scoped = new Map<number, ModelIndex>(); // by unlisted prior; a handful of values at most

  constructor(model: Model) {
    this.#base = buildIndex(model);
  }

  /** The index with priors for this unlisted share. */
  scoped(unlistedPrior: number): ModelIndex {
    let index = this.#scoped.get(unlistedPrior);
    if (!index) {
      if (this.#scoped.size > 8) this.#scoped.clear();
      index = { ...this.#base, ...priorsFor(this.#base, unlistedPrior) };
      this.#scoped.set(unlistedPrior, index);
    }
    return index;
  }

  /** Every check's bearings expanded to leaves, made on first use. */
  checkLeaves(): CheckLeaves {
    return (this.#checkLeaves ??= expandAllChecks(this.#base));
  }

  /** All checks cheapest first (ties: id), for the cheapest-first comparison; costs never change. */
  costOrder(): Int32Array {
    if (!this.#costOrder) {
      const { cost, checkIds } = this.#base;
      const inverse = cost.map((c) => 1 / c); // cheapest = largest 1/cost (costs are > 0)
      this.#costOrder = orderByKeyDesc(
        inverse,
        cost.length,
        (a, b) => cost[a] - cost[b] || compareIds(checkIds[a], checkIds[b]),
      );
    }
    return this.#costOrder;
  }

  /** Leaves by base rate, highest first (ties: id). Leaves no evidence touches keep this order. */
  priorOrder(): Int32Array {
    if (!this.#priorOrder) {
      const { leafWeight, tree } = this.#base;
      const id = (leaf: number) => tree.ids[tree.leafCause[leaf]];
      this.#priorOrder = orderByKeyDesc(
        leafWeight,
        leafWeight.length,
        (a, b) => leafWeight[b] - leafWeight[a] || compareIds(id(a), id(b)),
      );
    }
    return this.#priorOrder;
  }
}

export function compileModel(model: Model): CompiledModel {
  return new CompiledModel(model);
}

export function toCompiled(model: Model | CompiledModel): CompiledModel {
  if (model instanceof CompiledModel) return model;
  if (!model || typeof model !== "object") fail("INVALID_INPUT", "A model is required.");
  return new CompiledModel(model);
}
