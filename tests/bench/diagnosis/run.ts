// Runs the benchmark cases the way the product does: each phrase through Quick find (its top
// symptom hit, recorded unless Quick find calls it a weak match), each reading through the
// measurement rules, then the ranking with history only and with the findings, and the check plan
// from the history. Pure: returns figures, prints nothing. Features the engine may not have yet
// (weak matches, polarity, codes kept, conditions, graded readings) are used when present, so the
// same runner measured the code before and after the changes.
import * as measure from "../../../app/measure";
import * as quickFind from "../../../app/quick-find";
import {
  compileModel,
  planChecks,
  rankCauses,
  type Evidence,
  type RankOptions,
} from "../../../app/reasoning";
import { starterKnowledgeBase as kb } from "../../../seeds/kb";
import type { BenchCase, CaseFinding, Phrase } from "./case-types";
import { modelFor } from "./model";

type Observation = Evidence["observations"][number];
type Finding = Evidence["findings"][number];
type Hit = { entry: quickFind.Entry; score: number; weak?: boolean; present?: boolean; code?: string };

let index: quickFind.QuickFindIndex | null = null;
const quickFindIndex = () => (index ??= quickFind.buildIndex(quickFind.entriesFromKnowledgeBase(kb)));
const checkByKey = new Map(kb.checks.map((c) => [c.key, c]));
const symptomKeys = new Set(kb.symptoms.map((s) => s.key));

export type PhraseOutcome = {
  phrase: Phrase;
  got: string | null;
  present: boolean;
  weak: boolean;
  correct: boolean;
};

/** Quick find's answer to one typed phrase: the top symptom, the polarity it offers, and whether it is a weak match. */
export function lookUp(p: Phrase): PhraseOutcome & { observation: Observation | null } {
  const groups = quickFind.search(quickFindIndex(), p.text, { kinds: ["symptom"] });
  const top = groups.find((g) => g.kind === "symptom")?.items[0] as Hit | undefined;
  const weak = top === undefined || top.weak === true;
  const got = top && !weak ? top.entry.id : null;
  const present = top?.present ?? true;
  const correct = p.means === null ? got === null : got === p.means && present === p.present;
  const parsed = quickFind.parseQuery(p.text) as ReturnType<typeof quickFind.parseQuery> & {
    conditions?: string[];
  };
  let observation: Observation | null = null;
  if (got !== null && symptomKeys.has(got)) {
    observation = { symptomId: got, present, source: p.by };
    if (parsed.conditions?.length)
      (observation as Observation & { conditions?: string[] }).conditions = parsed.conditions;
  }
  return { phrase: p, got, present, weak, correct, observation };
}

/** A recorded finding: pass/fail as given, or the reading against the check's rule (graded where the module can). */
export function findingOf(f: CaseFinding): Finding {
  if (f.result) return { checkId: f.check, result: f.result };
  const check = checkByKey.get(f.check);
  if (!check || check.result.kind !== "measurement") throw new Error(`${f.check} takes no reading`);
  const grade = (measure as Record<string, unknown>).gradeReading as
    | ((rule: string, reading: string, scale?: string) => { result: "pass" | "fail"; band: string | null })
    | undefined;
  if (grade) {
    const g = grade(check.result.rule, f.reading!, (check.result as { gradeScale?: string }).gradeScale);
    return g.band
      ? ({ checkId: f.check, result: g.result, band: g.band } as Finding)
      : { checkId: f.check, result: g.result };
  }
  return { checkId: f.check, result: measure.evaluateRule(check.result.rule, f.reading!).result };
}

export type CaseOutcome = {
  id: string;
  listed: boolean; // the answer is a failure mode of the knowledge base
  phrases: PhraseOutcome[];
  rankHistory: number; // rank of the answer (1 = first) among the causes and "not in the knowledge base"
  rankFindings: number;
  rankHistoryMeant: number; // the same with each phrase recorded as meant (Quick find bypassed): the engine alone
  rankFindingsMeant: number;
  unlistedRankHistory: number;
  unlistedRankFindings: number;
  unlistedFindings: number;
  topFindings: string; // the leading hypothesis with findings ("(not in the KB)" for U)
  plan: { expected: number; cheapest: number }[]; // from the history, and from history + findings
};

const UNLISTED = "(not in the KB)";

function ranks(
  model: ReturnType<typeof compileModel>,
  evidence: Evidence,
  answer: string,
  options?: RankOptions,
) {
  const r = rankCauses(model, evidence, options);
  const pAnswer =
    answer === UNLISTED ? r.unlisted : (r.causes.find((c) => c.id === answer)?.probability ?? 0);
  const above = (p: number) => r.causes.filter((c) => c.probability > p).length;
  const rank = 1 + above(pAnswer) + (answer !== UNLISTED && r.unlisted > pAnswer ? 1 : 0);
  const unlistedRank = 1 + above(r.unlisted);
  const top = r.causes[0] && r.causes[0].probability >= r.unlisted ? r.causes[0].id : UNLISTED;
  return { rank, unlistedRank, unlisted: r.unlisted, top };
}

/** One case; `options` lets a calibration sweep try other figures (the bench itself uses the defaults). */
export function runCase(c: BenchCase, options?: RankOptions): CaseOutcome {
  const compiled = compileModel(modelFor(c.vehicle));
  const looked = c.said.map(lookUp);
  const observations = looked.flatMap((l) => (l.observation ? [l.observation] : []));
  // One observation per symptom and source: a repeat with the other polarity keeps the first.
  const seen = new Set<string>();
  const history: Evidence = {
    observations: observations.filter(
      (o) => !seen.has(`${o.symptomId}|${o.source}`) && seen.add(`${o.symptomId}|${o.source}`),
    ),
    findings: [],
  };
  const full: Evidence = { observations: history.observations, findings: c.findings.map(findingOf) };
  const answer = "cause" in c.answer ? c.answer.cause : UNLISTED;
  const h = ranks(compiled, history, answer, options);
  const f = ranks(compiled, full, answer, options);
  const meant: Evidence = {
    observations: c.said.flatMap((p) =>
      p.means !== null && symptomKeys.has(p.means)
        ? [{ symptomId: p.means, present: p.present, source: p.by }]
        : [],
    ),
    findings: [],
  };
  const seenMeant = new Set<string>();
  meant.observations = meant.observations.filter(
    (o) => !seenMeant.has(`${o.symptomId}|${o.source}`) && seenMeant.add(`${o.symptomId}|${o.source}`),
  );
  const hm = ranks(compiled, meant, answer, options);
  const fm = ranks(compiled, { ...meant, findings: full.findings }, answer, options);
  const plan = [history, full].map((e) => {
    const p = planChecks(compiled, e, options);
    return { expected: p.expectedCost, cheapest: p.cheapestFirstExpectedCost };
  });
  return {
    id: c.id,
    listed: "cause" in c.answer,
    phrases: looked.map(({ observation: _o, ...rest }) => rest),
    rankHistory: h.rank,
    rankFindings: f.rank,
    rankHistoryMeant: hm.rank,
    rankFindingsMeant: fm.rank,
    unlistedRankHistory: h.unlistedRank,
    unlistedRankFindings: f.unlistedRank,
    unlistedFindings: f.unlisted,
    topFindings: f.top,
    plan,
  };
}

export type Summary = Record<string, number>;

const pct = (n: number, d: number) => (d === 0 ? 0 : (100 * n) / d);

export function summarise(outcomes: CaseOutcome[]): Summary {
  const phrases = outcomes.flatMap((o) => o.phrases);
  const listed = outcomes.filter((o) => o.listed);
  const missing = outcomes.filter((o) => !o.listed);
  const plans = outcomes.flatMap((o) => o.plan);
  const eps = 1e-9;
  return {
    cases: outcomes.length,
    listedCases: listed.length,
    missingCases: missing.length,
    phrases: phrases.length,
    phraseAccuracy: pct(phrases.filter((p) => p.correct).length, phrases.length),
    phraseWrongPolarity: phrases.filter(
      (p) => p.phrase.means !== null && p.got === p.phrase.means && p.present !== p.phrase.present,
    ).length,
    phraseWeak: phrases.filter((p) => p.weak).length,
    top1History: pct(listed.filter((o) => o.rankHistory <= 1).length, listed.length),
    top3History: pct(listed.filter((o) => o.rankHistory <= 3).length, listed.length),
    top1Findings: pct(listed.filter((o) => o.rankFindings <= 1).length, listed.length),
    top3Findings: pct(listed.filter((o) => o.rankFindings <= 3).length, listed.length),
    meantTop1History: pct(listed.filter((o) => o.rankHistoryMeant <= 1).length, listed.length),
    meantTop3History: pct(listed.filter((o) => o.rankHistoryMeant <= 3).length, listed.length),
    meantTop1Findings: pct(listed.filter((o) => o.rankFindingsMeant <= 1).length, listed.length),
    meantTop3Findings: pct(listed.filter((o) => o.rankFindingsMeant <= 3).length, listed.length),
    allTop1Findings: pct(outcomes.filter((o) => o.rankFindings <= 1).length, outcomes.length),
    allTop3Findings: pct(outcomes.filter((o) => o.rankFindings <= 3).length, outcomes.length),
    unlistedTop2History: pct(missing.filter((o) => o.unlistedRankHistory <= 2).length, missing.length),
    unlistedTop2Findings: pct(missing.filter((o) => o.unlistedRankFindings <= 2).length, missing.length),
    unlistedMeanRankHistory:
      missing.reduce((s, o) => s + o.unlistedRankHistory, 0) / Math.max(1, missing.length),
    unlistedMeanRankFindings:
      missing.reduce((s, o) => s + o.unlistedRankFindings, 0) / Math.max(1, missing.length),
    unlistedWorstRankFindings: Math.max(0, ...missing.map((o) => o.unlistedRankFindings)),
    unlistedMeanMissing: pct(
      missing.reduce((s, o) => s + o.unlistedFindings, 0),
      missing.length,
    ),
    unlistedMeanListed: pct(
      listed.reduce((s, o) => s + o.unlistedFindings, 0),
      listed.length,
    ),
    planExpected: plans.reduce((s, p) => s + p.expected, 0) / plans.length,
    planCheapest: plans.reduce((s, p) => s + p.cheapest, 0) / plans.length,
    planWorseThanCheapest: plans.filter((p) => p.expected > p.cheapest * (1 + eps)).length,
    plans: plans.length,
  };
}
