// What-if: the top cause if a check fails or passes, without recording it.
import { describe, expect, it } from "vitest";
import { planChecks, rankCauses, whatIf, type Model } from "~/reasoning";
import { generateCase } from "./reference/generate";

// P(A) = .6, P(B) = .3, P(U) = .1; k fails .9 on A, false alarm .2
const model: Model = {
  causes: [
    { id: "A", prior: 2 },
    { id: "B", prior: 1 },
  ],
  symptoms: [],
  links: [],
  checks: [
    { id: "k", cost: 10, falseAlarm: 0.2, bears: [{ causeId: "A", pFail: 0.9 }] },
    { id: "never", cost: 10, falseAlarm: 0, bears: [{ causeId: "A", pFail: 0 }] },
  ],
};
const none = { observations: [], findings: [] };

describe("what-if", () => {
  it("hand values", () => {
    // fail: A .54, B .06, U .02 (Z = .62) → A at 27/31; pass: A .06, B .24, U .08 (Z = .38) → B at 12/19
    const w = whatIf(model, none, "k", { unlistedPrior: 0.1 });
    expect(w.pFail).toBeCloseTo(0.62, 14);
    expect(w.ifFail).toEqual({
      topCauseId: "A",
      probability: expect.closeTo(0.54 / 0.62, 14),
      unlisted: expect.closeTo(0.02 / 0.62, 14),
    });
    expect(w.ifPass).toEqual({
      topCauseId: "B",
      probability: expect.closeTo(12 / 19, 14),
      unlisted: expect.closeTo(4 / 19, 14),
    });
  });

  it("a check that cannot fail has no fail outcome", () => {
    const w = whatIf(model, none, "never", { unlistedPrior: 0 });
    expect(w.pFail).toBe(0);
    expect(w.ifFail).toBeNull();
    expect(w.ifPass?.topCauseId).toBe("A");
  });

  it("'not in the knowledge base' can become the top", () => {
    // unlisted .5 → A = 1/3, B = 1/6; k passes: A (1/3)(.1) = 1/30, B (1/6)(.8) = 4/30,
    // U .5 × .8 = 12/30; Z = 17/30 → U on top at 12/17
    const w = whatIf(model, none, "k", { unlistedPrior: 0.5 });
    expect(w.ifPass).toEqual({
      topCauseId: null,
      probability: expect.closeTo(12 / 17, 14),
      unlisted: expect.closeTo(12 / 17, 14),
    });
  });

  it("matches ranking with the finding recorded, on random models", () => {
    for (const seed of [21, 22, 23]) {
      const { model: m, evidence } = generateCase({ causes: 50, links: 150, checks: 30, evidence: 8 }, seed);
      const done = new Set(evidence.findings.map((f) => f.checkId));
      for (const k of m.checks.filter((c) => !done.has(c.id)).slice(0, 5)) {
        const w = whatIf(m, evidence, k.id);
        for (const result of ["fail", "pass"] as const) {
          const r = rankCauses(m, {
            ...evidence,
            findings: [...evidence.findings, { checkId: k.id, result }],
          });
          const out = result === "fail" ? w.ifFail! : w.ifPass!;
          const top = r.causes[0].probability >= r.unlisted ? r.causes[0] : null;
          expect(out.topCauseId).toBe(top?.id ?? null);
          expect(out.probability).toBeCloseTo(top?.probability ?? r.unlisted, 12);
          expect(out.unlisted).toBeCloseTo(r.unlisted, 12);
        }
      }
    }
  });

  it("the plan carries the what-if of its first step", () => {
    const plan = planChecks(model, none, { unlistedPrior: 0.1 });
    expect(plan.next).toEqual(whatIf(model, none, plan.steps[0].checkId, { unlistedPrior: 0.1 }));
  });
});
