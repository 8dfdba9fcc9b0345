// Conditions as evidence: an observation "s under c₁…cₙ" has P = P(s | h) · Π πₖ(h), with
// πₖ = .9 where h's link lists cₖ, .15 where it lists other conditions only, .5 where it lists
// none (and for the leak and "not in the knowledge base"); absent: 1 − that. Hand-computed by
// Bayes' rule (Russell & Norvig, AIMA ch. 13).
import { describe, expect, it } from "vitest";
import { CONDITIONS, parseEvidence, rankCauses, ReasoningError, speedBand, type Model } from "~/reasoning";

// A and B equally likely; s (leak .05) shows with both at .8, A only under braking (its link says so).
const model: Model = {
  causes: [
    { id: "A", prior: 1 },
    { id: "B", prior: 1 },
  ],
  symptoms: [{ id: "s", leak: 0.05 }],
  links: [
    { symptomId: "s", causeId: "A", p: 0.8, when: ["braking"] },
    { symptomId: "s", causeId: "B", p: 0.8 },
  ],
  checks: [],
};
const seen = (present: boolean, conditions?: ("braking" | "high_speed" | "cold")[]) => ({
  observations: [{ symptomId: "s", present, ...(conditions ? { conditions } : {}) }],
  findings: [],
});
const pA = (e: ReturnType<typeof seen>, o = { unlistedPrior: 0 }) =>
  rankCauses(model, e, o).causes.find((c) => c.id === "A")!.probability;

describe("conditions", () => {
  it("without conditions the two are tied", () => {
    expect(pA(seen(true))).toBeCloseTo(0.5, 12);
  });

  it("raise the cause whose link lists the observed condition", () => {
    // A .8 · .9 = .72, B .8 · .5 = .4 → .72 / 1.12 = .642857
    expect(pA(seen(true, ["braking"]))).toBeCloseTo(0.72 / 1.12, 12);
  });

  it("lower it when the symptom is seen under a condition its link does not list", () => {
    // A .8 · .15 = .12, B .4 → .12 / .52 = .230769
    expect(pA(seen(true, ["high_speed"]))).toBeCloseTo(0.12 / 0.52, 12);
    // both conditions: A .8 · .9 · .15 = .108, B .8 · .25 = .2 → .108 / .308
    expect(pA(seen(true, ["braking", "high_speed"]))).toBeCloseTo(0.108 / 0.308, 12);
  });

  it("count for an absent symptom as 1 − P", () => {
    // "no judder under braking": A 1 − .72 = .28, B 1 − .4 = .6 → .28 / .88
    expect(pA(seen(false, ["braking"]))).toBeCloseTo(0.28 / 0.88, 12);
  });

  it("leave the leak and 'not in the knowledge base' at .5 per condition", () => {
    // unlisted .1, rate .2: priors .45, .45, .1 → A .324, B .18, U .1 · .2 · .5 = .01 → Z .514
    const r = rankCauses(model, seen(true, ["braking"]), { unlistedPrior: 0.1, unlistedSymptomRate: 0.2 });
    expect(r.unlisted).toBeCloseTo(0.01 / 0.514, 12);
  });

  it("refuse a condition that is not on the list, and parse the list as zod input", () => {
    const bad = {
      observations: [{ symptomId: "s", present: true, conditions: ["on Tuesdays"] }],
      findings: [],
    };
    expect(() => rankCauses(model, bad as never)).toThrow(ReasoningError);
    expect(() => parseEvidence(bad)).toThrow(ReasoningError);
    expect(parseEvidence(seen(true, ["braking", "cold"])).observations[0].conditions).toEqual([
      "braking",
      "cold",
    ]);
    expect(CONDITIONS).toContain("over_bumps");
  });

  it("band road speeds: below 30 km/h low, to 80 mid, above high (rule of thumb, common practice)", () => {
    expect([10, 29.9, 30, 79, 80, 130].map(speedBand)).toEqual([
      "low_speed",
      "low_speed",
      "mid_speed",
      "mid_speed",
      "high_speed",
      "high_speed",
    ]);
  });
});
