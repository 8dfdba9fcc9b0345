// Every check's bearings expanded to leaves (nearest node wins), as CSR arrays: the plan needs
// P(fail | leaf) for every remaining check, and this is the only per-leaf view of checks.
import type { BaseIndex } from "./model-index";

export type CheckLeaves = { start: Int32Array; leaf: Int32Array; pFail: Float64Array };

export function expandAllChecks(index: BaseIndex): CheckLeaves {
  const K = index.checkIds.length;
  const { lo, hi } = index.tree;
  // Upper bound on the expanded size (nested bearings overlap, so the real size may be smaller).
  let bound = 0;
  for (let j = 0; j < index.bearNode.length; j++) bound += hi[index.bearNode[j]] - lo[index.bearNode[j]];
  const start = new Int32Array(K + 1);
  const leaf = new Int32Array(bound);
  const pFail = new Float64Array(bound);
  const ex = index.expander;
  let at = 0;
  for (let k = 0; k < K; k++) {
    const from = index.bearStart[k];
    const m = index.bearStart[k + 1] - from;
    if (m === 1 && index.tree.leafOf[index.bearNode[from]] >= 0) {
      // The common case, a single leaf: no expansion needed.
      leaf[at] = index.tree.leafOf[index.bearNode[from]];
      pFail[at++] = index.bearP[from];
    } else {
      const n = ex.expand(index.bearNode, index.bearP, from, m);
      for (let j = 0; j < n; j++, at++) {
        leaf[at] = ex.leafAt(j);
        pFail[at] = ex.valueAt(j);
      }
    }
    start[k + 1] = at;
  }
  return { start, leaf: leaf.subarray(0, at), pFail: pFail.subarray(0, at) };
}
