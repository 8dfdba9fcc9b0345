// The "why": contributions are log likelihood ratios log(P(e|c) / P(e|¬c)), with ¬c weighted by
// the posterior just before the evidence arrived, so that for every cause
//   log odds(c | evidence) = log odds(c) before evidence + Σ contributions.
import { describe, expect, it } from "vitest";
import { rankCauses, type Evidence, type Model } from "~/reasoning";
import { dentist } from "./reference/dentist";
import { leaky } from "./reference/leaky";
import { generateCase } from "./reference/generate";

const logit = (p: number) => Math.log(p / (1 - p));

// Same hand case as the posterior tests (./reference/leaky.ts): P(A) = .6, P(B) = .3, P(U) = .1; s links A with .8, leak .1.
const model = leaky;
const sPresent: Evidence = { observations: [{ symptomId: "s", present: true }], findings: [] };

describe("contributions", () => {
  it("hand values: log(P(s|c) / P(s|¬c)) with ¬c weighted by the prior", () => {
    // A: P(s|A) = .8; P(s|¬A) = (.3 × .1 + .1 × .1) / .4 = .1 → log 8 = 2.0794
    // B: P(s|B) = .1; P(s|¬B) = (.6 × .8 + .1 × .1) / .7 = .49 / .7 = .7 → log(1/7) = −1.9459
    const r = rankCauses(model, sPresent, { unlistedPrior: 0.1 });
    const a = r.causes.find((c) => c.id === "A")!;
    const b = r.causes.find((c) => c.id === "B")!;
    expect(a.contributions["symptom:s"]).toBeCloseTo(Math.log(8), 12);
    expect(b.contributions["symptom:s"]).toBeCloseTo(Math.log(1 / 7), 12);
  });

  it("sign: a present symptom with high P(s|c) pushes c up; its absence pushes c down", () => {
    const up = rankCauses(model, sPresent).causes.find((c) => c.id === "A")!;
    expect(up.contributions["symptom:s"]).toBeGreaterThan(0);
    const down = rankCauses(model, {
      observations: [{ symptomId: "s", present: false }],
      findings: [],
    }).causes.find((c) => c.id === "A")!;
    expect(down.contributions["symptom:s"]).toBeLessThan(0);
    // A failed check that bears on A pushes A up; a pass pushes it down.
    const failA = rankCauses(model, {
      observations: [],
      findings: [{ checkId: "k", result: "fail" }],
    }).causes.find((c) => c.id === "A")!;
    expect(failA.contributions["check:k"]).toBeGreaterThan(0);
    const passA = rankCauses(model, {
      observations: [],
      findings: [{ checkId: "k", result: "pass" }],
    }).causes.find((c) => c.id === "A")!;
    expect(passA.contributions["check:k"]).toBeLessThan(0);
  });

  it("two causes: the contribution is the textbook likelihood ratio (dentist, Russell & Norvig ch. 13)", () => {
    // P(toothache|cavity) = .6, P(toothache|¬cavity) = .1 → log 6; catch .9 / .2 → log 4.5
    const e: Evidence = {
      observations: [
        { symptomId: "toothache", present: true },
        { symptomId: "catch", present: true },
      ],
      findings: [],
    };
    const cavity = rankCauses(dentist, e, { unlistedPrior: 0 }).causes[0];
    expect(cavity.contributions).toEqual({
      "symptom:toothache": expect.closeTo(Math.log(6), 12),
      "symptom:catch": expect.closeTo(Math.log(4.5), 12),
    });
    // logit(.2) + log 6 + log 4.5 = log(.25 × 27) = log 6.75 = logit(.108 / .124)
    expect(logit(0.2) + Math.log(6) + Math.log(4.5)).toBeCloseTo(logit(cavity.probability), 12);
  });

  it("prior log odds + Σ contributions = posterior log odds, for every cause of random models", () => {
    for (const seed of [11, 12, 13]) {
      const { model: m, evidence } = generateCase({ causes: 40, links: 150, checks: 30, evidence: 15 }, seed);
      const r = rankCauses(m, evidence);
      for (const c of r.causes) {
        const sum = Object.values(c.contributions).reduce((s, w) => s + w, 0);
        expect(Object.keys(c.contributions)).toHaveLength(15);
        expect(logit(c.prior) + sum).toBeCloseTo(logit(c.probability), 9);
      }
    }
  });

  it("a cause ruled out by the evidence gets −Infinity for that item, never NaN", () => {
    // P(s | A) = 1 and s absent: A is impossible.
    const sure: Model = { ...model, links: [{ symptomId: "s", causeId: "A", p: 1 }] };
    const r = rankCauses(sure, { observations: [{ symptomId: "s", present: false }], findings: [] });
    const a = r.causes.find((c) => c.id === "A")!;
    expect(a.probability).toBe(0);
    expect(a.contributions["symptom:s"]).toBe(-Infinity);
    for (const c of r.causes)
      for (const w of Object.values(c.contributions)) expect(Number.isNaN(w)).toBe(false);
  });

  it("are included when the ranking is serialised", () => {
    const r = rankCauses(model, sPresent);
    const json = JSON.parse(JSON.stringify(r));
    expect(json.causes[0].contributions["symptom:s"]).toBeCloseTo(r.causes[0].contributions["symptom:s"], 12);
    expect(Object.keys(json.causes[0]).sort()).toEqual(["contributions", "id", "prior", "probability"]);
  });
});
