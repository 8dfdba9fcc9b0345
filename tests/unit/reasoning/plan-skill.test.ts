// Skill gating: an apprentice's plan holds only checks within their level; the others are
// listed apart, each with where it would have come in the ungated plan.
import { describe, expect, it } from "vitest";
import { planChecks, type Model } from "~/reasoning";

// Perfect checks, unlisted 0; p/c: a1 .4/10 = .04, s1 .3/5 = .06, t1 .2/10 = .02, a2 .1/10 = .01
const model: Model = {
  causes: [
    { id: "c-a1", prior: 0.4 },
    { id: "c-s1", prior: 0.3 },
    { id: "c-t1", prior: 0.2 },
    { id: "c-a2", prior: 0.1 },
  ],
  symptoms: [],
  links: [],
  checks: [
    { id: "a1", cost: 10, falseAlarm: 0, skill: "apprentice", bears: [{ causeId: "c-a1", pFail: 1 }] },
    { id: "s1", cost: 5, falseAlarm: 0, skill: "senior", bears: [{ causeId: "c-s1", pFail: 1 }] },
    { id: "t1", cost: 10, falseAlarm: 0, bears: [{ causeId: "c-t1", pFail: 1 }] }, // no skill given: technician
    { id: "a2", cost: 10, falseAlarm: 0, skill: "apprentice", bears: [{ causeId: "c-a2", pFail: 1 }] },
  ],
};
const none = { observations: [], findings: [] };

describe("skill gating", () => {
  it("no limit: every check in value order", () => {
    const plan = planChecks(model, none, { unlistedPrior: 0 });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["s1", "a1", "t1", "a2"]);
    expect(plan.aboveSkill).toEqual([]);
    expect(plan.steps.map((s) => s.skill)).toEqual(["senior", "apprentice", "technician", "apprentice"]);
  });

  it("apprentice: own checks only; the rest marked where a more skilled person is needed", () => {
    const plan = planChecks(model, none, { unlistedPrior: 0, maxSkill: "apprentice" });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["a1", "a2"]);
    // s1 would have come before the apprentice's first step, t1 between a1 and a2
    expect(plan.aboveSkill.map((s) => [s.checkId, s.skill, s.before])).toEqual([
      ["s1", "senior", 0],
      ["t1", "technician", 1],
    ]);
    // ECR of the apprentice's own plan: 10 + (1 − .4) × 10 = 16; cheapest first is the same order
    expect(plan.expectedCost).toBeCloseTo(16, 12);
    expect(plan.cheapestFirstExpectedCost).toBeCloseTo(16, 12);
  });

  it("technician: senior checks wait", () => {
    const plan = planChecks(model, none, { unlistedPrior: 0, maxSkill: "technician" });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["a1", "t1", "a2"]);
    expect(plan.aboveSkill.map((s) => s.checkId)).toEqual(["s1"]);
    expect(plan.next?.checkId).toBe("a1");
  });
});
