// The cause tree, flattened once per call. Leaves are numbered in depth-first order, so the
// leaves below any node are one contiguous range [lo, hi): a link or check attached to a node
// expands to that range without walking the tree again.
import { fail } from "./errors";
import type { Cause } from "./schema";

export type Tree = {
  ids: string[]; // cause index -> id
  names: (string | undefined)[];
  causeIndex: Map<string, number>; // id -> cause index
  parent: Int32Array; // cause index -> parent cause index, or -1 for a root
  depth: Int32Array; // roots have depth 0
  lo: Int32Array; // cause index -> first leaf below (or itself)
  hi: Int32Array; // cause index -> one past the last leaf below
  leafOf: Int32Array; // cause index -> leaf index, or -1 for an inner node
  leafCause: Int32Array; // leaf index -> cause index
  leafCount: number;
  childStart: Int32Array; // children of cause i: childList[childStart[i] .. childStart[i+1])
  childList: Int32Array;
  innerPostOrder: Int32Array; // inner nodes, every child before its parent
};

export function buildTree(causes: readonly Cause[]): Tree {
  const n = causes.length;
  if (n === 0) fail("EMPTY_MODEL", "The model has no causes, so there is nothing to rank.");
  const causeIndex = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const c = causes[i];
    if (typeof c?.id !== "string" || c.id === "") fail("INVALID_INPUT", `Cause number ${i + 1} has no id.`);
    if (causeIndex.has(c.id)) fail("DUPLICATE_ID", `Two causes have the id "${c.id}".`);
    causeIndex.set(c.id, i);
  }
  const parent = new Int32Array(n);
  const childCount = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    const pid = causes[i].parentId;
    if (pid === undefined || pid === null) {
      parent[i] = -1;
      continue;
    }
    const p = causeIndex.get(pid);
    if (p === undefined)
      fail("UNKNOWN_ID", `Cause "${causes[i].id}" has parent "${pid}", which is not a cause.`);
    parent[i] = p;
    childCount[p]++;
  }
  const depth = computeDepths(parent, causes);
  // Children in CSR form, kept in input order so results do not depend on hashing.
  const childStart = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) childStart[i + 1] = childStart[i] + childCount[i];
  const fillAt = childStart.slice(0, n);
  const childList = new Int32Array(Math.max(0, childStart[n]));
  for (let i = 0; i < n; i++) if (parent[i] >= 0) childList[fillAt[parent[i]]++] = i;

  const lo = new Int32Array(n);
  const hi = new Int32Array(n);
  const leafOf = new Int32Array(n).fill(-1);
  const leafCauseList: number[] = [];
  const innerPost: number[] = [];
  const stack = new Int32Array(n);
  const nextChild = childStart.slice(0, n);
  for (let r = 0; r < n; r++) {
    if (parent[r] !== -1) continue;
    let sp = 0;
    stack[sp++] = r;
    lo[r] = leafCauseList.length;
    while (sp > 0) {
      const v = stack[sp - 1];
      if (childStart[v + 1] === childStart[v]) {
        leafOf[v] = leafCauseList.length;
        leafCauseList.push(v);
        hi[v] = leafCauseList.length;
        sp--;
      } else if (nextChild[v] < childStart[v + 1]) {
        const c = childList[nextChild[v]++];
        lo[c] = leafCauseList.length;
        stack[sp++] = c;
      } else {
        hi[v] = leafCauseList.length;
        innerPost.push(v);
        sp--;
      }
    }
  }
  return {
    ids: causes.map((c) => c.id),
    names: causes.map((c) => c.name),
    causeIndex,
    parent,
    depth,
    lo,
    hi,
    leafOf,
    leafCause: Int32Array.from(leafCauseList),
    leafCount: leafCauseList.length,
    childStart,
    childList,
    innerPostOrder: Int32Array.from(innerPost),
  };
}

// Depth of every cause by walking up to a root, memoised; a walk that meets itself is a cycle.
function computeDepths(parent: Int32Array, causes: readonly Cause[]): Int32Array {
  const n = parent.length;
  const depth = new Int32Array(n).fill(-1);
  const onPath = new Uint8Array(n);
  const path: number[] = [];
  for (let i = 0; i < n; i++) {
    let v = i;
    while (v !== -1 && depth[v] < 0) {
      if (onPath[v]) {
        const loop = path.slice(path.indexOf(v)).map((k) => causes[k].id);
        fail(
          "CYCLE",
          `The cause tree loops: ${[...loop, causes[v].id].join(" → ")}. A cause cannot sit below itself.`,
        );
      }
      onPath[v] = 1;
      path.push(v);
      v = parent[v];
    }
    let d = v === -1 ? -1 : depth[v];
    for (let k = path.length - 1; k >= 0; k--) {
      depth[path[k]] = ++d;
      onPath[path[k]] = 0;
    }
    path.length = 0;
  }
  return depth;
}
