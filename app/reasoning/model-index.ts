// Index of a Model: ids resolved to integer indices, links grouped by symptom and check
// bearings grouped by check (CSR arrays). Built in one pass over the model, so a whole rank +
// plan stays linear in its size. Every range and cross-reference is checked here, so the maths
// downstream never sees NaN. Priors depend on the unlisted share, so they are added per call.
import { READING_BANDS, type ReadingBand } from "./bands";
import { conditionMask } from "./conditions";
import { checkCostValue, checkProbability, fail } from "./errors";
import { LeafExpander } from "./expand";
import { DEFAULT_CHECK_SKILL, skillRank } from "./options";
import type { Model } from "./schema";
import { buildTree, type Tree } from "./tree";

export type BaseIndex = {
  tree: Tree;
  leafCount: number;
  hypotheses: number; // leaves + 1; the last hypothesis is "not in the knowledge base"
  leafWeight: Float64Array; // the leaves' relative base rates as given
  leafWeightSum: number;
  symptomIndex: Map<string, number>;
  leak: Float64Array;
  unlistedP: Float64Array; // the symptom's own P(s | not in the knowledge base), NaN where it has none
  linkStart: Int32Array; // links of symptom s: linkNode/linkP[linkStart[s] .. linkStart[s+1])
  linkNode: Int32Array; // cause index (leaf or inner node)
  linkP: Float64Array;
  linkWhen: Int32Array | null; // conditions under which each link's cause shows the symptom, as bits; null if no link has any
  checkIndex: Map<string, number>;
  checkIds: string[];
  checkNames: (string | undefined)[];
  cost: Float64Array;
  falseAlarm: Float64Array;
  skill: Int8Array; // 0 apprentice, 1 technician, 2 senior
  bearStart: Int32Array; // bearings of check k: bearNode/bearP[bearStart[k] .. bearStart[k+1])
  bearNode: Int32Array;
  bearP: Float64Array;
  bearGraded: Float64Array | null; // 4 per bearing in READING_BANDS order, NaN where none; null if no bearing has any
  expander: LeafExpander;
};

export type ModelIndex = BaseIndex & {
  prior: Float64Array; // per hypothesis, sums to 1
  logPrior: Float64Array;
};

const DEFAULT_SKILL_RANK = skillRank(DEFAULT_CHECK_SKILL, "default skill");

export function buildIndex(model: Model): BaseIndex {
  if (!model || !Array.isArray(model.causes) || !Array.isArray(model.symptoms)) {
    fail("INVALID_INPUT", "A model needs arrays of causes, symptoms, links and checks.");
  }
  const tree = buildTree(model.causes);
  const L = tree.leafCount;
  const { leafWeight, leafWeightSum } = leafWeights(model, tree);

  const symptomIndex = new Map<string, number>();
  const leak = new Float64Array(model.symptoms.length);
  const unlistedP = new Float64Array(model.symptoms.length).fill(Number.NaN);
  for (let i = 0; i < model.symptoms.length; i++) {
    const s = model.symptoms[i];
    if (symptomIndex.has(s.id)) fail("DUPLICATE_ID", `Two symptoms have the id "${s.id}".`);
    symptomIndex.set(s.id, i);
    leak[i] = checkProbability(s.leak, () => `The leak of symptom "${s.id}"`);
    if (s.unlisted !== undefined)
      unlistedP[i] = checkProbability(s.unlisted, () => `P(${s.id} | not in the knowledge base)`);
  }

  const links = model.links ?? [];
  const linkSym = new Int32Array(links.length);
  const linkCause = new Int32Array(links.length);
  for (let i = 0; i < links.length; i++) {
    const l = links[i];
    const s = symptomIndex.get(l.symptomId);
    if (s === undefined)
      fail("UNKNOWN_ID", `A link names symptom "${l.symptomId}", which is not in the model.`);
    const c = tree.causeIndex.get(l.causeId);
    if (c === undefined) fail("UNKNOWN_ID", `A link names cause "${l.causeId}", which is not in the model.`);
    // Tested inline so the per-link cost is one comparison; checkProbability only builds the error.
    if (typeof l.p !== "number" || !(l.p >= 0 && l.p <= 1))
      checkProbability(l.p, () => `P(${l.symptomId} | ${l.causeId})`);
    linkSym[i] = s;
    linkCause[i] = c;
  }
  const link = groupBy(linkSym, linkCause, model.symptoms.length, links);
  const linkWhen = link.when.some((w) => w !== 0) ? link.when : null;
  rejectDuplicates(
    link.start,
    link.node,
    tree,
    (s, c) => `symptom "${model.symptoms[s].id}" and cause "${c}"`,
  );

  const checks = model.checks ?? [];
  const checkIndex = new Map<string, number>();
  const cost = new Float64Array(checks.length);
  const falseAlarm = new Float64Array(checks.length);
  const skill = new Int8Array(checks.length);
  // Checks are already grouped (each lists its own bearings), so the CSR arrays fill in order.
  const bearStart = new Int32Array(checks.length + 1);
  for (let i = 0; i < checks.length; i++) {
    const bears = checks[i].bears;
    if (!Array.isArray(bears))
      fail("INVALID_INPUT", `Check "${checks[i].id}" has no list of causes it bears on.`);
    bearStart[i + 1] = bearStart[i] + bears.length;
  }
  const bearNode = new Int32Array(bearStart[checks.length]);
  const bearP = new Float64Array(bearStart[checks.length]);
  let bearGraded: Float64Array | null = null;
  for (let i = 0; i < checks.length; i++) {
    const k = checks[i];
    if (checkIndex.has(k.id)) fail("DUPLICATE_ID", `Two checks have the id "${k.id}".`);
    checkIndex.set(k.id, i);
    cost[i] = checkCostValue(k.cost, () => `The cost of check "${k.id}"`);
    falseAlarm[i] = checkProbability(k.falseAlarm, () => `The false-alarm rate of check "${k.id}"`);
    skill[i] =
      k.skill === undefined ? DEFAULT_SKILL_RANK : skillRank(k.skill, `The skill of check "${k.id}"`);
    for (let j = 0, at = bearStart[i]; j < k.bears.length; j++, at++) {
      const b = k.bears[j];
      const c = tree.causeIndex.get(b.causeId);
      if (c === undefined)
        fail("UNKNOWN_ID", `Check "${k.id}" bears on cause "${b.causeId}", which is not in the model.`);
      bearNode[at] = c;
      if (typeof b.pFail !== "number" || !(b.pFail >= 0 && b.pFail <= 1))
        checkProbability(b.pFail, () => `P(${k.id} fails | ${b.causeId})`);
      bearP[at] = b.pFail;
      if (b.graded !== undefined) {
        bearGraded ??= new Float64Array(4 * bearP.length).fill(Number.NaN);
        gradedInto(bearGraded, at, b.graded, () => `${k.id} on ${b.causeId}`);
      }
    }
  }
  const bear = { start: bearStart, node: bearNode, value: bearP };
  rejectDuplicates(bear.start, bear.node, tree, (k, c) => `check "${checks[k].id}" and cause "${c}"`);

  return {
    tree,
    leafCount: L,
    hypotheses: L + 1,
    leafWeight,
    leafWeightSum,
    symptomIndex,
    leak,
    unlistedP,
    linkStart: link.start,
    linkNode: link.node,
    linkP: link.value,
    linkWhen,
    checkIndex,
    checkIds: checks.map((k) => k.id),
    checkNames: checks.map((k) => k.name),
    cost,
    falseAlarm,
    skill,
    bearStart: bear.start,
    bearNode: bear.node,
    bearP: bear.value,
    bearGraded,
    expander: new LeafExpander(tree),
  };
}

function gradedInto(out: Float64Array, at: number, graded: Record<ReadingBand, number>, what: () => string) {
  let sum = 0;
  READING_BANDS.forEach((band, i) => {
    const p = checkProbability(graded?.[band], () => `P(${band} | ${what()})`);
    out[4 * at + i] = p;
    sum += p;
  });
  if (Math.abs(sum - 1) > 1e-6)
    fail(
      "INVALID_PROBABILITY",
      `The graded figures of ${what()} add up to ${sum}; the four bands must add up to 1.`,
    );
}

// Inner nodes' priors are validated but ignored: a node's share is always the sum of its leaves.
function leafWeights(model: Model, tree: Tree) {
  for (let i = 0; i < model.causes.length; i++) {
    const p = model.causes[i].prior;
    if (typeof p !== "number" || !Number.isFinite(p) || p < 0) {
      fail("INVALID_PRIOR", `Cause "${model.causes[i].id}" has prior ${String(p)}; it must be 0 or more.`);
    }
  }
  const leafWeight = new Float64Array(tree.leafCount);
  let leafWeightSum = 0;
  for (let leaf = 0; leaf < tree.leafCount; leaf++)
    leafWeightSum += leafWeight[leaf] = model.causes[tree.leafCause[leaf]].prior;
  if (!(leafWeightSum > 0))
    fail("ZERO_PRIOR", "Every candidate cause has prior 0; at least one needs a positive base rate.");
  return { leafWeight, leafWeightSum };
}

/** Priors per hypothesis: leaves share 1 − u in proportion to their base rates; "not in the knowledge base" gets u. */
export function priorsFor(base: BaseIndex, u: number): { prior: Float64Array; logPrior: Float64Array } {
  const L = base.leafCount;
  const prior = new Float64Array(L + 1);
  for (let leaf = 0; leaf < L; leaf++) prior[leaf] = ((1 - u) * base.leafWeight[leaf]) / base.leafWeightSum;
  prior[L] = u;
  return { prior, logPrior: prior.map(Math.log) };
}

// Counting sort of links into CSR arrays by symptom: O(links + symptoms).
function groupBy(group: Int32Array, node: Int32Array, groups: number, links: Model["links"]) {
  const start = new Int32Array(groups + 1);
  for (let i = 0; i < group.length; i++) start[group[i] + 1]++;
  for (let g = 0; g < groups; g++) start[g + 1] += start[g];
  const at = start.slice(0, groups);
  const outNode = new Int32Array(group.length);
  const outValue = new Float64Array(group.length);
  const outWhen = new Int32Array(group.length);
  for (let i = 0; i < group.length; i++) {
    const k = at[group[i]]++;
    outNode[k] = node[i];
    outValue[k] = links[i].p;
    if (links[i].when?.length) outWhen[k] = whenMask(links[i]);
  }
  return { start, node: outNode, value: outValue, when: outWhen };
}

function whenMask(l: Model["links"][number]): number {
  try {
    return conditionMask(l.when, () => `The link of "${l.symptomId}" to "${l.causeId}"`);
  } catch (e) {
    return fail("INVALID_INPUT", (e as Error).message);
  }
}

function rejectDuplicates(
  start: Int32Array,
  node: Int32Array,
  tree: Tree,
  what: (g: number, cause: string) => string,
) {
  const seen = new Int32Array(tree.ids.length).fill(-1);
  for (let g = 0; g + 1 < start.length; g++) {
    for (let j = start[g]; j < start[g + 1]; j++) {
      if (seen[node[j]] === g) fail("DUPLICATE_LINK", `The model links ${what(g, tree.ids[node[j]])} twice.`);
      seen[node[j]] = g;
    }
  }
}
