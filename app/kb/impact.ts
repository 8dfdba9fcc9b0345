// The impact of a knowledge-base change on the workshop's own history, before it is made: each
// case with a confirmed cause is ranked again on its recorded evidence under the base as it is and
// as it would be, and the confirmed cause's place compared. How many have it first and in the top
// three, before and after, and which cases moved: the knowledge base's regression test. Pure.
import { type Evidence, rankCauses, type VehicleFacts } from "~/reasoning";
import { knownEvidence } from "~/cases/known-evidence";
import { buildModel, type Knowledge } from "./model";

export type KbChange =
  | { link: "symptom"; symptomId: string; causeId: string; p: number }
  | { link: "check"; checkId: string; causeId: string; p: number }
  // A failure mode not in the base yet, shown as one symptom (a technician's proposal of a missing cause).
  | { link: "new-cause"; parentId: string; name: string; baseRate: number; symptomId: string; p: number }
  // A symptom not in the base yet, pointing to a cause: no recorded case names it, so it can only
  // move cases once they do; previewed all the same, so a senior sees that.
  | { link: "new-symptom"; name: string; leak: number; causeId: string; p: number };

/** The id the previewed new cause has inside the preview; it is never written. */
export const PROPOSED_CAUSE = "proposed-cause";

export type ImpactCase = {
  id: string;
  number: number;
  /** A test case's name; workshop cases are named by their number. */
  label?: string;
  answerId: string; // the confirmed cause
  answerName: string;
  fuel: string;
  facts: VehicleFacts;
  evidence: Evidence;
};

export type Moved = {
  id: string;
  number: number;
  label?: string;
  answerName: string;
  before: number | null;
  after: number | null;
};
export type Impact = {
  cases: number;
  first: { before: number; after: number };
  topThree: { before: number; after: number };
  moved: Moved[];
};

/** A preview of the workshop's concluded cases, with its kept test cases beside them. */
export type ImpactWithTests = Impact & { tests?: Impact };

/** The base with one link set to a new strength (added when the pair was not linked). */
export function withChange(kb: Knowledge, change: KbChange): Knowledge {
  if (change.link === "new-symptom")
    return {
      ...kb,
      symptoms: [...kb.symptoms, { id: "proposed-symptom", name: change.name, leak: change.leak }],
      symptomLinks: [
        ...kb.symptomLinks,
        { symptomId: "proposed-symptom", causeId: change.causeId, p: change.p },
      ],
    };
  if (change.link === "new-cause")
    return {
      ...kb,
      causes: [
        ...kb.causes,
        {
          id: PROPOSED_CAUSE,
          parentId: change.parentId,
          level: "failure_mode",
          name: change.name,
          baseRate: change.baseRate,
          applicability: {},
        },
      ],
      symptomLinks: [
        ...kb.symptomLinks,
        { symptomId: change.symptomId, causeId: PROPOSED_CAUSE, p: change.p },
      ],
    };
  if (change.link === "symptom") {
    const others = kb.symptomLinks.filter(
      (l) => !(l.symptomId === change.symptomId && l.causeId === change.causeId),
    );
    return {
      ...kb,
      symptomLinks: [...others, { symptomId: change.symptomId, causeId: change.causeId, p: change.p }],
    };
  }
  const others = kb.checkLinks.filter((l) => !(l.checkId === change.checkId && l.causeId === change.causeId));
  return {
    ...kb,
    checkLinks: [...others, { checkId: change.checkId, causeId: change.causeId, pFail: change.p }],
  };
}

/** The confirmed cause's place (1 = first) in each case's ranking under `kb`, null when unranked. */
export function places(
  kb: Knowledge,
  cases: ImpactCase[],
  labourRate: number,
  outcomes: Record<string, Record<string, number>>,
) {
  // Cases of the same vehicle facts share a model, as the live ranking's cache does.
  const models = new Map<string, ReturnType<typeof buildModel>>();
  return cases.map((c) => {
    const key = JSON.stringify([c.facts, c.fuel]);
    let model = models.get(key);
    if (!model) models.set(key, (model = buildModel(kb, c.facts, labourRate, outcomes[c.fuel] ?? {})));
    // A kept test case may name an item this version lacks: rank it on what the version knows.
    const evidence = knownEvidence(kb, c.evidence).evidence;
    const at = rankCauses(model, evidence).causes.findIndex((r) => r.id === c.answerId);
    return at < 0 ? null : at + 1;
  });
}

export function impactOf(
  before: Knowledge,
  after: Knowledge,
  cases: ImpactCase[],
  labourRate: number,
  outcomes: Record<string, Record<string, number>>,
): Impact {
  const was = places(before, cases, labourRate, outcomes);
  const now = places(after, cases, labourRate, outcomes);
  const count = (list: (number | null)[], max: number) => list.filter((p) => p !== null && p <= max).length;
  return {
    cases: cases.length,
    first: { before: count(was, 1), after: count(now, 1) },
    topThree: { before: count(was, 3), after: count(now, 3) },
    moved: cases
      .map((c, i) => ({
        id: c.id,
        number: c.number,
        ...(c.label ? { label: c.label } : {}),
        answerName: c.answerName,
        before: was[i],
        after: now[i],
      }))
      .filter((m) => m.before !== m.after),
  };
}
