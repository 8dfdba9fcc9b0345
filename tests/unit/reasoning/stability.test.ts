// Log space: hundreds of pieces of evidence must give finite, normalised probabilities where a
// product of likelihoods would underflow to 0.
import { describe, expect, it } from "vitest";
import { planChecks, rankCauses, type Model } from "~/reasoning";
import { generateCase } from "./reference/generate";

describe("numerical stability", () => {
  it("200 symptoms: exact answer where the plain product underflows", () => {
    // 200 symptoms, each P(s | A) = .01, P(s | B) = .02, all present; equal priors, no unlisted.
    // The products .01^200 = 1e−400 and .02^200 ≈ 1.6e−340 both underflow a double; the answer is
    // P(A) = 1 / (1 + 2^200) ≈ 6.2e−61 (the likelihood ratio is (.02/.01)^200 = 2^200).
    const n = 200;
    const model: Model = {
      causes: [
        { id: "A", prior: 1 },
        { id: "B", prior: 1 },
      ],
      symptoms: Array.from({ length: n }, (_, i) => ({ id: `s${i}`, leak: 0.01 })),
      links: Array.from({ length: n }, (_, i) => [
        { symptomId: `s${i}`, causeId: "A", p: 0.01 },
        { symptomId: `s${i}`, causeId: "B", p: 0.02 },
      ]).flat(),
      checks: [],
    };
    expect(0.01 ** 200).toBe(0);
    const e = {
      observations: Array.from({ length: n }, (_, i) => ({ symptomId: `s${i}`, present: true })),
      findings: [],
    };
    const r = rankCauses(model, e, { unlistedPrior: 0 });
    const a = r.causes.find((c) => c.id === "A")!;
    expect(a.probability / (1 / (1 + 2 ** 200))).toBeCloseTo(1, 10);
    expect(r.causes[0]).toMatchObject({ id: "B", probability: 1 });
    // Each symptom's weight for A is log(.01/.02) only while B is not yet certain; all are finite.
    for (const w of Object.values(a.contributions)) expect(Number.isFinite(w)).toBe(true);
  });

  it("200 mixed pieces of evidence on a random model: finite and normalised", () => {
    const { model, evidence } = generateCase({ causes: 300, links: 2000, checks: 200, evidence: 200 }, 77);
    expect(evidence.observations.length + evidence.findings.length).toBe(200);
    const r = rankCauses(model, evidence);
    const total = r.causes.reduce((s, c) => s + c.probability, 0) + r.unlisted;
    expect(total).toBeCloseTo(1, 12);
    for (const c of r.causes) {
      expect(Number.isFinite(c.probability)).toBe(true);
      for (const w of Object.values(c.contributions)) expect(Number.isNaN(w)).toBe(false);
    }
    for (const v of Object.values(r.nodes)) expect(Number.isFinite(v)).toBe(true);
    const plan = planChecks(model, evidence);
    expect(Number.isFinite(plan.expectedCost)).toBe(true);
    expect(Number.isFinite(plan.cheapestFirstExpectedCost)).toBe(true);
    for (const s of plan.steps) expect(Number.isFinite(s.ratio) && Number.isFinite(s.pReached)).toBe(true);
  });
});
