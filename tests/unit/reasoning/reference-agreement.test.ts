// The fast engine against the straightforward reference implementation on random models
// (seeded), with trees, links on inner nodes, owner reports, findings and skill gating.
import { describe, expect, it } from "vitest";
import { compileModel, diagnose, planChecks, rankCauses } from "~/reasoning";
import { generateCase } from "./reference/generate";
import { naiveDiagnose } from "./reference/naive";

describe("fast engine = reference implementation", () => {
  for (const seed of [1, 2, 3, 4, 5, 6, 7, 8]) {
    it(`random model, seed ${seed}`, () => {
      const { model, evidence } = generateCase({ causes: 60, links: 200, checks: 40, evidence: 12 }, seed);
      const fast = rankCauses(model, evidence);
      const ref = naiveDiagnose(model, evidence);
      expect(fast.causes.map((c) => c.id)).toEqual(ref.causes.map((c) => c.id));
      fast.causes.forEach((c, i) => {
        expect(c.probability).toBeCloseTo(ref.causes[i].probability, 12);
        for (const [key, w] of Object.entries(ref.causes[i].contributions))
          expect(c.contributions[key]).toBeCloseTo(w, 8);
      });
      expect(fast.unlisted).toBeCloseTo(ref.unlisted, 12);

      const plan = planChecks(model, evidence);
      expect(plan.steps.map((s) => s.checkId)).toEqual(ref.steps.map((s) => s.checkId));
      plan.steps.forEach((s, i) => expect(s.pFind).toBeCloseTo(ref.steps[i].pFind, 12));
      expect(plan.expectedCost).toBeCloseTo(ref.expectedCost, 8);
      expect(plan.cheapestFirstExpectedCost).toBeCloseTo(ref.cheapestFirstExpectedCost, 8);
    });
  }

  it("agrees with a skill limit and no unlisted share", () => {
    const { model, evidence } = generateCase({ causes: 80, links: 300, checks: 60, evidence: 15 }, 42);
    const ref = naiveDiagnose(model, evidence, 0, 0.7, "apprentice");
    const plan = planChecks(model, evidence, { unlistedPrior: 0, maxSkill: "apprentice" });
    expect(plan.steps.map((s) => s.checkId)).toEqual(ref.steps.map((s) => s.checkId));
    expect(plan.expectedCost).toBeCloseTo(ref.expectedCost, 8);
    expect(plan.cheapestFirstExpectedCost).toBeCloseTo(ref.cheapestFirstExpectedCost, 8);
  });

  it("diagnose() gives the same ranking and plan as the two separate calls", () => {
    const { model, evidence } = generateCase({ causes: 50, links: 150, checks: 30, evidence: 10 }, 9);
    const both = diagnose(model, evidence);
    const json = (x: unknown) => JSON.parse(JSON.stringify(x)); // includes every cause's contributions
    expect(json(both.ranking)).toEqual(json(rankCauses(model, evidence)));
    expect(both.plan).toEqual(planChecks(model, evidence));
  });

  it("a compiled model gives the same answers and is a snapshot", () => {
    const { model, evidence } = generateCase({ causes: 50, links: 150, checks: 30, evidence: 10 }, 10);
    const json = (x: unknown) => JSON.parse(JSON.stringify(x));
    const compiled = compileModel(model);
    const before = json(diagnose(model, evidence));
    expect(json(diagnose(compiled, evidence))).toEqual(before);
    expect(json(diagnose(compiled, evidence, { unlistedPrior: 0 }))).toEqual(
      json(diagnose(model, evidence, { unlistedPrior: 0 })),
    );
    model.links.forEach((l) => (l.p = 0.5)); // later edits do not reach the compiled copy
    expect(json(diagnose(compiled, evidence))).toEqual(before);
  });
});
