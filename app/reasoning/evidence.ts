// Evidence turned into likelihood vectors over the hypotheses (leaves + "not in the knowledge
// base"). Each item is sparse: one default likelihood for every hypothesis the item says nothing
// specific about (the symptom's leak, the check's false-alarm rate) and explicit values for the
// leaves its links reach.
import {
  bandLikelihood,
  FAULT_BAND_SHARE,
  PASSING_BANDS,
  READING_BANDS,
  SOUND_BAND_SHARE,
  type ReadingBand,
} from "./bands";
import { conditionFactor, conditionMask } from "./conditions";
import { fail } from "./errors";
import type { ModelIndex } from "./model-index";
import type { Evidence, Observation } from "./schema";

export type EvidenceItem = {
  key: string; // "symptom:<id>" or "check:<id>": the key of this item in a cause's contributions
  defaultLik: number; // for leaves not in `leaves`
  unlistedLik: number; // for "not in the knowledge base"
  leaves: Int32Array;
  liks: Float64Array; // likelihood at leaves[j]
};

/**
 * P(symptom present | the fault is not in the knowledge base) = max(leak, ρ): a fault nobody has
 * written down still shows itself, so it explains any symptom with at least ρ (the unlisted
 * symptom rate), not only with the symptom's leak. A symptom may state its own figure instead
 * (`own`, NaN when it has none). Absent: 1 − that. Checks are unchanged: under "not in the
 * knowledge base" a check fails only by false alarm.
 */
export function unlistedSymptomLik(leak: number, rate: number, present: boolean, own = Number.NaN): number {
  const p = Number.isNaN(own) ? Math.max(leak, rate) : own;
  return present ? p : 1 - p;
}

export function resolveEvidence(
  index: ModelIndex,
  evidence: Evidence,
  ownerReliability: number,
  unlistedRate = 0,
): EvidenceItem[] {
  if (!evidence || !Array.isArray(evidence.observations) || !Array.isArray(evidence.findings)) {
    fail("INVALID_INPUT", "Evidence needs a list of observations and a list of findings.");
  }
  const items: EvidenceItem[] = [];
  for (const o of chooseObservations(evidence.observations)) {
    const s = index.symptomIndex.get(o.symptomId);
    if (s === undefined)
      fail("UNKNOWN_ID", `An observation names symptom "${o.symptomId}", which is not in the model.`);
    const observed = o.conditions?.length ? observedMask(o) : 0;
    const item =
      observed === 0
        ? expandItem(
            index,
            `symptom:${o.symptomId}`,
            index.leak[s],
            index.linkStart,
            index.linkNode,
            index.linkP,
            s,
            o.present,
          )
        : conditionedItem(index, `symptom:${o.symptomId}`, s, observed, o.present);
    const anyFactor = observed === 0 ? 1 : conditionFactor(observed, 0);
    const pUnlisted = unlistedSymptomLik(index.leak[s], unlistedRate, true, index.unlistedP[s]) * anyFactor;
    item.unlistedLik = o.present ? pUnlisted : 1 - pUnlisted;
    if ((o.source ?? "technician") === "owner") temperOwnerReport(index, item, ownerReliability);
    items.push(item);
  }
  for (const f of chooseFindings(evidence.findings)) {
    const k = index.checkIndex.get(f.checkId);
    if (k === undefined)
      fail("UNKNOWN_ID", `A finding names check "${f.checkId}", which is not in the model.`);
    if (f.result !== "pass" && f.result !== "fail") {
      fail(
        "INVALID_INPUT",
        `The finding for check "${f.checkId}" is "${String(f.result)}"; use pass or fail.`,
      );
    }
    if (f.band !== undefined) {
      if (!READING_BANDS.includes(f.band))
        fail(
          "INVALID_INPUT",
          `The reading band of check "${f.checkId}" is "${String(f.band)}"; use ${READING_BANDS.join(", ")}.`,
        );
      if (PASSING_BANDS.has(f.band) !== (f.result === "pass")) {
        fail(
          "INVALID_INPUT",
          `Check "${f.checkId}" is recorded as ${f.result} with a reading ${f.band.replace("_", " ")} the limit; the two must agree.`,
        );
      }
      items.push(bandItem(index, k, f.band));
      continue;
    }
    items.push(
      expandItem(
        index,
        `check:${f.checkId}`,
        index.falseAlarm[k],
        index.bearStart,
        index.bearNode,
        index.bearP,
        k,
        f.result === "fail",
      ),
    );
  }
  return items;
}

/** The likelihood vector of "check k gave this result", for what-if and planning. */
export function checkItem(index: ModelIndex, k: number, failed: boolean): EvidenceItem {
  return expandItem(
    index,
    `check:${index.checkIds[k]}`,
    index.falseAlarm[k],
    index.bearStart,
    index.bearNode,
    index.bearP,
    k,
    failed,
  );
}

function observedMask(o: Observation): number {
  try {
    return conditionMask(o.conditions, () => `The observation of "${o.symptomId}"`);
  } catch (e) {
    return fail("INVALID_INPUT", (e as Error).message);
  }
}

/**
 * A symptom seen under conditions: each hypothesis's P(s | h) times Π πₖ(h) over the observed
 * conditions (CONDITION_MATCH where its link lists the condition, CONDITION_MISS where the link
 * lists others only, CONDITION_ANY where it lists none, and for the leak); 1 − that if absent.
 */
function conditionedItem(
  index: ModelIndex,
  key: string,
  s: number,
  observed: number,
  present: boolean,
): EvidenceItem {
  const from = index.linkStart[s];
  const m = index.linkStart[s + 1] - from;
  const values = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const p =
      index.linkP[from + j] * conditionFactor(observed, index.linkWhen ? index.linkWhen[from + j] : 0);
    values[j] = present ? p : 1 - p;
  }
  const ex = index.expander;
  const n = ex.expand(index.linkNode.subarray(from, from + m), values, 0, m);
  const leaves = new Int32Array(n);
  const liks = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    leaves[j] = ex.leafAt(j);
    liks[j] = ex.valueAt(j);
  }
  const leak = index.leak[s] * conditionFactor(observed, 0);
  const defaultLik = present ? leak : 1 - leak;
  return { key, defaultLik, unlistedLik: defaultLik, leaves, liks };
}

/**
 * A measured finding by its band: P(band | leaf) from the bearing's graded figures where it has
 * them, else its P(fail | leaf) split by the default shares; every other hypothesis (other leaves,
 * "not in the knowledge base") gets the false-alarm rate split by the sound-part shares.
 */
function bandItem(index: ModelIndex, k: number, band: ReadingBand): EvidenceItem {
  const from = index.bearStart[k];
  const m = index.bearStart[k + 1] - from;
  const b = READING_BANDS.indexOf(band);
  const values = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const own = index.bearGraded ? index.bearGraded[4 * (from + j) + b] : Number.NaN;
    values[j] = Number.isNaN(own) ? bandLikelihood(index.bearP[from + j], band, FAULT_BAND_SHARE) : own;
  }
  const ex = index.expander;
  const n = ex.expand(index.bearNode.subarray(from, from + m), values, 0, m);
  const leaves = new Int32Array(n);
  const liks = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    leaves[j] = ex.leafAt(j);
    liks[j] = ex.valueAt(j);
  }
  const background = bandLikelihood(index.falseAlarm[k], band, SOUND_BAND_SHARE);
  return { key: `check:${index.checkIds[k]}`, defaultLik: background, unlistedLik: background, leaves, liks };
}

// P(e | h) for "present"/"failed" is the stored figure; for "absent"/"passed" it is 1 − figure.
function expandItem(
  index: ModelIndex,
  key: string,
  background: number,
  start: Int32Array,
  node: Int32Array,
  p: Float64Array,
  g: number,
  positive: boolean,
): EvidenceItem {
  const from = start[g];
  const m = start[g + 1] - from;
  const ex = index.expander;
  const n = ex.expand(node, p, from, m);
  const leaves = new Int32Array(n);
  const liks = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    leaves[j] = ex.leafAt(j);
    liks[j] = positive ? ex.valueAt(j) : 1 - ex.valueAt(j);
  }
  const defaultLik = positive ? background : 1 - background;
  return { key, defaultLik, unlistedLik: defaultLik, leaves, liks };
}

// Owner report: P'(e|h) = r·P(e|h) + (1 − r)·P(e), with P(e) the chance of the report under the
// prior. Mixing (rather than raising to a power) keeps a wrong owner report from ruling a cause
// out entirely: P' is never 0 while P(e) > 0.
function temperOwnerReport(index: ModelIndex, item: EvidenceItem, r: number): void {
  const pU = index.prior[index.leafCount];
  let linkedMass = 0;
  let linkedLik = 0;
  for (let j = 0; j < item.leaves.length; j++) {
    const w = index.prior[item.leaves[j]];
    linkedMass += w;
    linkedLik += w * item.liks[j];
  }
  const marginal = Math.min(
    1,
    Math.max(0, item.defaultLik * Math.max(0, 1 - linkedMass - pU) + linkedLik + pU * item.unlistedLik),
  );
  item.defaultLik = r * item.defaultLik + (1 - r) * marginal;
  item.unlistedLik = r * item.unlistedLik + (1 - r) * marginal;
  for (let j = 0; j < item.liks.length; j++) item.liks[j] = r * item.liks[j] + (1 - r) * marginal;
}

// One observation per symptom: a technician's confirmation replaces the owner's report; two
// reports from the same source that disagree are refused rather than guessed between.
function chooseObservations(observations: readonly Observation[]): Observation[] {
  const chosen = new Map<string, Observation>();
  for (const o of observations) {
    if (typeof o?.present !== "boolean")
      fail("INVALID_INPUT", `The observation of "${o?.symptomId}" needs present: true or false.`);
    const source = o.source ?? "technician";
    if (source !== "owner" && source !== "technician")
      fail("INVALID_INPUT", `Observation source "${String(source)}" is not owner or technician.`);
    const before = chosen.get(o.symptomId);
    if (!before) {
      chosen.set(o.symptomId, o);
      continue;
    }
    const beforeSource = before.source ?? "technician";
    if (beforeSource === source) {
      if (before.present !== o.present) {
        fail(
          "CONFLICTING_EVIDENCE",
          `Symptom "${o.symptomId}" is recorded both present and absent by the ${source}.`,
        );
      }
    } else if (source === "technician") {
      chosen.set(o.symptomId, o);
    }
  }
  return [...chosen.values()];
}

function chooseFindings(findings: Evidence["findings"]): Evidence["findings"] {
  const chosen = new Map<string, Evidence["findings"][number]>();
  for (const f of findings) {
    const before = chosen.get(f.checkId);
    if (before && before.result !== f.result) {
      fail(
        "CONFLICTING_EVIDENCE",
        `Check "${f.checkId}" is recorded as both passed and failed; keep the latest result only.`,
      );
    }
    chosen.set(f.checkId, f);
  }
  return [...chosen.values()];
}
