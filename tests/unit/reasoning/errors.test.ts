// Bad input gives a ReasoningError with a code and a message naming what is wrong — never NaN.
import { describe, expect, it } from "vitest";
import {
  compileModel,
  diagnose,
  orderCost,
  parseEvidence,
  parseModel,
  planChecks,
  rankCauses,
  REASONING_ERROR_CODES,
  ReasoningError,
  whatIf,
  type Evidence,
  type Model,
} from "~/reasoning";

const good = (): Model => ({
  causes: [
    { id: "sys", prior: 0 },
    { id: "A", parentId: "sys", prior: 1 },
    { id: "B", parentId: "sys", prior: 1 },
  ],
  symptoms: [{ id: "s", leak: 0.1 }],
  links: [{ symptomId: "s", causeId: "A", p: 0.8 }],
  checks: [{ id: "k", cost: 10, falseAlarm: 0.1, bears: [{ causeId: "A", pFail: 0.9 }] }],
});
const none: Evidence = { observations: [], findings: [] };

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (e instanceof ReasoningError) {
      expect(e.message.length).toBeGreaterThan(10);
      return e.code;
    }
    throw e;
  }
  return "no error";
}
const rank = (m: Model, e: Evidence = none, o = {}) => codeOf(() => rankCauses(m, e, o));
const change = (f: (m: Model) => void): Model => {
  const m = good();
  f(m);
  return m;
};

describe("model errors", () => {
  it("EMPTY_MODEL", () =>
    expect(rank({ causes: [], symptoms: [], links: [], checks: [] })).toBe("EMPTY_MODEL"));

  it("DUPLICATE_ID for causes, symptoms and checks", () => {
    expect(rank(change((m) => m.causes.push({ id: "A", prior: 1 })))).toBe("DUPLICATE_ID");
    expect(rank(change((m) => m.symptoms.push({ id: "s", leak: 0.2 })))).toBe("DUPLICATE_ID");
    expect(rank(change((m) => m.checks.push({ ...m.checks[0] })))).toBe("DUPLICATE_ID");
  });

  it("UNKNOWN_ID in the tree, links and checks", () => {
    expect(rank(change((m) => (m.causes[1].parentId = "nowhere")))).toBe("UNKNOWN_ID");
    expect(rank(change((m) => m.links.push({ symptomId: "ghost", causeId: "A", p: 0.5 })))).toBe(
      "UNKNOWN_ID",
    );
    expect(rank(change((m) => m.links.push({ symptomId: "s", causeId: "ghost", p: 0.5 })))).toBe(
      "UNKNOWN_ID",
    );
    expect(rank(change((m) => m.checks[0].bears.push({ causeId: "ghost", pFail: 0.5 })))).toBe("UNKNOWN_ID");
  });

  it("INVALID_PROBABILITY for leak, link, false alarm and P(fail), including NaN", () => {
    expect(rank(change((m) => (m.symptoms[0].leak = 1.2)))).toBe("INVALID_PROBABILITY");
    expect(rank(change((m) => (m.links[0].p = -0.1)))).toBe("INVALID_PROBABILITY");
    expect(rank(change((m) => (m.links[0].p = Number.NaN)))).toBe("INVALID_PROBABILITY");
    expect(rank(change((m) => (m.checks[0].falseAlarm = 2)))).toBe("INVALID_PROBABILITY");
    expect(rank(change((m) => (m.checks[0].bears[0].pFail = Number.NaN)))).toBe("INVALID_PROBABILITY");
    expect(rank(change((m) => ((m.links[0] as { p: unknown }).p = "0.5")))).toBe("INVALID_PROBABILITY");
  });

  it("INVALID_PRIOR and ZERO_PRIOR", () => {
    expect(rank(change((m) => (m.causes[1].prior = -1)))).toBe("INVALID_PRIOR");
    expect(rank(change((m) => (m.causes[0].prior = Infinity)))).toBe("INVALID_PRIOR");
    expect(rank(change((m) => m.causes.forEach((c) => (c.prior = 0))))).toBe("ZERO_PRIOR");
  });

  it("INVALID_COST for negative, zero and non-numeric costs", () => {
    expect(rank(change((m) => (m.checks[0].cost = -5)))).toBe("INVALID_COST");
    expect(rank(change((m) => (m.checks[0].cost = 0)))).toBe("INVALID_COST");
    expect(rank(change((m) => (m.checks[0].cost = Number.NaN)))).toBe("INVALID_COST");
  });

  it("CYCLE, including a cause that is its own parent", () => {
    expect(rank(change((m) => (m.causes[0].parentId = "A")))).toBe("CYCLE");
    expect(rank(change((m) => m.causes.push({ id: "self", parentId: "self", prior: 1 })))).toBe("CYCLE");
    const loop = change((m) =>
      m.causes.push(
        { id: "x", parentId: "y", prior: 1 },
        { id: "y", parentId: "z", prior: 1 },
        { id: "z", parentId: "x", prior: 1 },
      ),
    );
    expect(() => rankCauses(loop, none)).toThrow(/x → y → z → x|y → z → x → y|z → x → y → z/);
  });

  it("DUPLICATE_LINK for symptom links and check bearings", () => {
    expect(rank(change((m) => m.links.push({ symptomId: "s", causeId: "A", p: 0.3 })))).toBe(
      "DUPLICATE_LINK",
    );
    expect(rank(change((m) => m.checks[0].bears.push({ causeId: "A", pFail: 0.3 })))).toBe("DUPLICATE_LINK");
  });

  it("INVALID_INPUT from the schemas and from a bad skill", () => {
    expect(codeOf(() => parseModel({ causes: "none" }))).toBe("INVALID_INPUT");
    expect(codeOf(() => parseModel({ ...good(), links: [{ symptomId: "s", causeId: "A", p: 3 }] }))).toBe(
      "INVALID_INPUT",
    );
    expect(codeOf(() => parseEvidence({ observations: [{ symptomId: "s" }], findings: [] }))).toBe(
      "INVALID_INPUT",
    );
    expect(parseModel(good())).toEqual(good());
    expect(rank(change((m) => ((m.checks[0] as { skill: unknown }).skill = "wizard")))).toBe(
      "INVALID_OPTION",
    );
    expect(codeOf(() => rankCauses(null as unknown as Model, none))).toBe("INVALID_INPUT");
    expect(rank(good(), null as unknown as Evidence)).toBe("INVALID_INPUT");
  });
});

describe("evidence and option errors", () => {
  it("UNKNOWN_ID for observations, findings, what-if and orders", () => {
    expect(rank(good(), { observations: [{ symptomId: "ghost", present: true }], findings: [] })).toBe(
      "UNKNOWN_ID",
    );
    expect(rank(good(), { observations: [], findings: [{ checkId: "ghost", result: "fail" }] })).toBe(
      "UNKNOWN_ID",
    );
    expect(codeOf(() => whatIf(good(), none, "ghost"))).toBe("UNKNOWN_ID");
    expect(codeOf(() => orderCost(good(), none, ["ghost"]))).toBe("UNKNOWN_ID");
    expect(codeOf(() => orderCost(good(), none, ["k", "k"]))).toBe("INVALID_INPUT");
  });

  it("CONFLICTING_EVIDENCE", () => {
    const obs = (present: boolean) => ({ symptomId: "s", present, source: "owner" as const });
    expect(rank(good(), { observations: [obs(true), obs(false)], findings: [] })).toBe(
      "CONFLICTING_EVIDENCE",
    );
    expect(
      rank(good(), {
        observations: [],
        findings: [
          { checkId: "k", result: "fail" },
          { checkId: "k", result: "pass" },
        ],
      }),
    ).toBe("CONFLICTING_EVIDENCE");
    // the same report twice is not a conflict, and counts once
    const twice = rankCauses(good(), { observations: [obs(true), obs(true)], findings: [] });
    expect(Object.keys(twice.causes[0].contributions)).toEqual(["symptom:s"]);
  });

  it("IMPOSSIBLE_EVIDENCE when nothing, listed or not, can explain it", () => {
    // leak 0, no cause linked with p > 0 and "not in the knowledge base" told it never shows it
    // (rate 0): a present symptom nobody can produce
    const m = change((x) => {
      x.symptoms[0].leak = 0;
      x.links[0].p = 0;
    });
    const seen = { observations: [{ symptomId: "s", present: true }], findings: [] };
    expect(rank(m, seen, { unlistedSymptomRate: 0 })).toBe("IMPOSSIBLE_EVIDENCE");
    // with the default rate the unknown fault explains it
    expect(rank(m, seen)).toBe("no error");
  });

  it("ALREADY_RECORDED for what-if on a done check", () => {
    expect(
      codeOf(() => whatIf(good(), { observations: [], findings: [{ checkId: "k", result: "pass" }] }, "k")),
    ).toBe("ALREADY_RECORDED");
  });

  it("INVALID_OPTION", () => {
    expect(rank(good(), none, { unlistedPrior: 1 })).toBe("INVALID_OPTION");
    expect(rank(good(), none, { unlistedPrior: -0.1 })).toBe("INVALID_OPTION");
    expect(rank(good(), none, { ownerReliability: 1.5 })).toBe("INVALID_OPTION");
    expect(rank(good(), none, { unlistedSymptomRate: 1.2 })).toBe("INVALID_OPTION");
    expect(codeOf(() => planChecks(good(), none, { maxSkill: "wizard" as "senior" }))).toBe("INVALID_OPTION");
  });

  it("the list of codes is exactly the codes tested above (a new code needs a test here)", () => {
    expect([...REASONING_ERROR_CODES].sort()).toEqual(
      [
        "EMPTY_MODEL",
        "INVALID_INPUT",
        "DUPLICATE_ID",
        "UNKNOWN_ID",
        "INVALID_PROBABILITY",
        "INVALID_PRIOR",
        "ZERO_PRIOR",
        "INVALID_COST",
        "CYCLE",
        "DUPLICATE_LINK",
        "CONFLICTING_EVIDENCE",
        "IMPOSSIBLE_EVIDENCE",
        "ALREADY_RECORDED",
        "INVALID_OPTION",
      ].sort(),
    );
  });
});

describe("never NaN", () => {
  it("extreme but valid figures (0s and 1s everywhere) give finite, normalised results", () => {
    const m: Model = {
      causes: [
        { id: "A", prior: 1 },
        { id: "B", prior: 0 },
        { id: "C", prior: 1e-300 },
      ],
      symptoms: [{ id: "s", leak: 1 }],
      links: [{ symptomId: "s", causeId: "A", p: 1 }],
      checks: [
        { id: "k0", cost: 1e-9, falseAlarm: 0, bears: [{ causeId: "C", pFail: 1 }] },
        { id: "k1", cost: 1e9, falseAlarm: 1, bears: [] },
      ],
    };
    for (const unlistedPrior of [0, 0.05]) {
      const { ranking, plan } = diagnose(
        compileModel(m),
        { observations: [{ symptomId: "s", present: true }], findings: [] },
        { unlistedPrior },
      );
      const all = [
        ...ranking.causes.map((c) => c.probability),
        ranking.unlisted,
        ...Object.values(ranking.nodes),
      ];
      for (const c of ranking.causes) all.push(...Object.values(c.contributions).filter(Number.isFinite));
      for (const s of plan.steps) all.push(s.pFind, s.ratio, s.cost, s.pReached);
      all.push(plan.expectedCost, plan.cheapestFirstExpectedCost, plan.saving);
      expect(all.some(Number.isNaN)).toBe(false);
      for (const c of ranking.causes)
        for (const w of Object.values(c.contributions)) expect(Number.isNaN(w)).toBe(false);
    }
  });
});
