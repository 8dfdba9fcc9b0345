// Per-call index of a Model: ids resolved to integer indices, links grouped by symptom and
// check bearings grouped by check (CSR arrays), priors normalised. Built in one pass over the
// model so a whole rank + plan stays linear in its size. Every range and cross-reference is
// checked here, so the maths downstream never sees NaN.
import { checkCostValue, checkProbability, fail } from "./errors";
import { LeafExpander } from "./expand";
import { skillRank } from "./options";
import type { Model } from "./schema";
import { buildTree, type Tree } from "./tree";

export type ModelIndex = {
  tree: Tree;
  leafCount: number;
  hypotheses: number; // leaves + 1; the last hypothesis is "not in the knowledge base"
  prior: Float64Array; // per hypothesis, sums to 1
  logPrior: Float64Array;
  symptomIndex: Map<string, number>;
  leak: Float64Array;
  linkStart: Int32Array; // links of symptom s: linkNode/linkP[linkStart[s] .. linkStart[s+1])
  linkNode: Int32Array; // cause index (leaf or inner node)
  linkP: Float64Array;
  checkIndex: Map<string, number>;
  checkIds: string[];
  checkNames: (string | undefined)[];
  cost: Float64Array;
  falseAlarm: Float64Array;
  skill: Int8Array; // 0 apprentice, 1 technician, 2 senior
  bearStart: Int32Array; // bearings of check k: bearNode/bearP[bearStart[k] .. bearStart[k+1])
  bearNode: Int32Array;
  bearP: Float64Array;
  expander: LeafExpander;
};

export function buildIndex(model: Model, unlistedPrior: number): ModelIndex {
  if (!model || !Array.isArray(model.causes) || !Array.isArray(model.symptoms)) {
    fail("INVALID_INPUT", "A model needs arrays of causes, symptoms, links and checks.");
  }
  const tree = buildTree(model.causes);
  const L = tree.leafCount;
  const { prior, logPrior } = leafPriors(model, tree, unlistedPrior);

  const symptomIndex = new Map<string, number>();
  const leak = new Float64Array(model.symptoms.length);
  model.symptoms.forEach((s, i) => {
    if (symptomIndex.has(s.id)) fail("DUPLICATE_ID", `Two symptoms have the id "${s.id}".`);
    symptomIndex.set(s.id, i);
    leak[i] = checkProbability(s.leak, `The leak of symptom "${s.id}"`);
  });

  const links = model.links ?? [];
  const linkSym = new Int32Array(links.length);
  const linkCause = new Int32Array(links.length);
  for (let i = 0; i < links.length; i++) {
    const l = links[i];
    const s = symptomIndex.get(l.symptomId);
    if (s === undefined) fail("UNKNOWN_ID", `A link names symptom "${l.symptomId}", which is not in the model.`);
    const c = tree.causeIndex.get(l.causeId);
    if (c === undefined) fail("UNKNOWN_ID", `A link names cause "${l.causeId}", which is not in the model.`);
    checkProbability(l.p, `P(${l.symptomId} | ${l.causeId})`);
    linkSym[i] = s;
    linkCause[i] = c;
  }
  const link = groupBy(linkSym, linkCause, model.symptoms.length, (i) => links[i].p);
  rejectDuplicates(link.start, link.node, tree, (s, c) => `symptom "${model.symptoms[s].id}" and cause "${c}"`);

  const checks = model.checks ?? [];
  const checkIndex = new Map<string, number>();
  const cost = new Float64Array(checks.length);
  const falseAlarm = new Float64Array(checks.length);
  const skill = new Int8Array(checks.length);
  const bearCheck: number[] = [];
  const bearCause: number[] = [];
  const bearValue: number[] = [];
  checks.forEach((k, i) => {
    if (checkIndex.has(k.id)) fail("DUPLICATE_ID", `Two checks have the id "${k.id}".`);
    checkIndex.set(k.id, i);
    cost[i] = checkCostValue(k.cost, `The cost of check "${k.id}"`);
    falseAlarm[i] = checkProbability(k.falseAlarm, `The false-alarm rate of check "${k.id}"`);
    skill[i] = skillRank(k.skill, `The skill of check "${k.id}"`);
    if (!Array.isArray(k.bears)) fail("INVALID_INPUT", `Check "${k.id}" has no list of causes it bears on.`);
    for (const b of k.bears) {
      const c = tree.causeIndex.get(b.causeId);
      if (c === undefined) fail("UNKNOWN_ID", `Check "${k.id}" bears on cause "${b.causeId}", which is not in the model.`);
      bearCheck.push(i);
      bearCause.push(c);
      bearValue.push(checkProbability(b.pFail, `P(${k.id} fails | ${b.causeId})`));
    }
  });
  const bear = groupBy(Int32Array.from(bearCheck), Int32Array.from(bearCause), checks.length, (i) => bearValue[i]);
  rejectDuplicates(bear.start, bear.node, tree, (k, c) => `check "${checks[k].id}" and cause "${c}"`);

  return {
    tree,
    leafCount: L,
    hypotheses: L + 1,
    prior,
    logPrior,
    symptomIndex,
    leak,
    linkStart: link.start,
    linkNode: link.node,
    linkP: link.value,
    checkIndex,
    checkIds: checks.map((k) => k.id),
    checkNames: checks.map((k) => k.name),
    cost,
    falseAlarm,
    skill,
    bearStart: bear.start,
    bearNode: bear.node,
    bearP: bear.value,
    expander: new LeafExpander(tree),
  };
}

// Leaf priors normalised to 1 − u; "not in the knowledge base" gets u. Inner nodes' priors are
// ignored: a node's share is always the sum of its leaves.
function leafPriors(model: Model, tree: Tree, u: number) {
  const L = tree.leafCount;
  const prior = new Float64Array(L + 1);
  let sum = 0;
  for (let i = 0; i < model.causes.length; i++) {
    const p = model.causes[i].prior;
    if (typeof p !== "number" || !Number.isFinite(p) || p < 0) {
      fail("INVALID_PRIOR", `Cause "${model.causes[i].id}" has prior ${String(p)}; it must be 0 or more.`);
    }
  }
  for (let leaf = 0; leaf < L; leaf++) sum += model.causes[tree.leafCause[leaf]].prior;
  if (!(sum > 0)) fail("ZERO_PRIOR", "Every candidate cause has prior 0; at least one needs a positive base rate.");
  for (let leaf = 0; leaf < L; leaf++) prior[leaf] = ((1 - u) * model.causes[tree.leafCause[leaf]].prior) / sum;
  prior[L] = u;
  const logPrior = prior.map(Math.log);
  return { prior, logPrior };
}

// Counting sort of (group, node, value) triples into CSR arrays: O(items + groups).
function groupBy(group: Int32Array, node: Int32Array, groups: number, valueOf: (i: number) => number) {
  const start = new Int32Array(groups + 1);
  for (let i = 0; i < group.length; i++) start[group[i] + 1]++;
  for (let g = 0; g < groups; g++) start[g + 1] += start[g];
  const at = start.slice(0, groups);
  const outNode = new Int32Array(group.length);
  const outValue = new Float64Array(group.length);
  for (let i = 0; i < group.length; i++) {
    const k = at[group[i]]++;
    outNode[k] = node[i];
    outValue[k] = valueOf(i);
  }
  return { start, node: outNode, value: outValue };
}

function rejectDuplicates(start: Int32Array, node: Int32Array, tree: Tree, what: (g: number, cause: string) => string) {
  const seen = new Int32Array(tree.ids.length).fill(-1);
  for (let g = 0; g + 1 < start.length; g++) {
    for (let j = start[g]; j < start[g + 1]; j++) {
      if (seen[node[j]] === g) fail("DUPLICATE_LINK", `The model links ${what(g, tree.ids[node[j]])} twice.`);
      seen[node[j]] = g;
    }
  }
}
