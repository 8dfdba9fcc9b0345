// Turns "value v attached to node n" pairs into per-leaf values. A pair on an inner node applies
// to every leaf below it; where pairs nest (a node and a leaf under it), the one nearest the leaf
// wins, because a curator who adds a specific figure means it to override the general one.
import type { Tree } from "./tree";

export class LeafExpander {
  private readonly stamp: Int32Array;
  private readonly value: Float64Array;
  private readonly touched: Int32Array;
  private epoch = 0;
  private count = 0;

  constructor(private readonly tree: Tree) {
    this.stamp = new Int32Array(tree.leafCount);
    this.value = new Float64Array(tree.leafCount);
    this.touched = new Int32Array(tree.leafCount);
  }

  /** Expand pairs nodes[from..from+m) / values[from..from+m) and return how many leaves they reach. */
  expand(nodes: Int32Array, values: Float64Array, from: number, m: number): number {
    const { tree } = this;
    this.epoch++;
    this.count = 0;
    let order: number[] | null = null;
    for (let j = from; j < from + m; j++) {
      if (tree.leafOf[nodes[j]] < 0 && m > 1) {
        // Inner nodes present: apply shallow pairs first so deeper (nearer) ones overwrite them.
        order = Array.from({ length: m }, (_, k) => from + k).sort(
          (a, b) => tree.depth[nodes[a]] - tree.depth[nodes[b]],
        );
        break;
      }
    }
    for (let k = 0; k < m; k++) {
      const j = order === null ? from + k : order[k];
      const node = nodes[j];
      const v = values[j];
      for (let leaf = tree.lo[node], end = tree.hi[node]; leaf < end; leaf++) {
        if (this.stamp[leaf] !== this.epoch) {
          this.stamp[leaf] = this.epoch;
          this.touched[this.count++] = leaf;
        }
        this.value[leaf] = v;
      }
    }
    return this.count;
  }

  /** After expand(): the k-th leaf reached and its value. */
  leafAt(k: number): number {
    return this.touched[k];
  }
  valueAt(k: number): number {
    return this.value[this.touched[k]];
  }
}
