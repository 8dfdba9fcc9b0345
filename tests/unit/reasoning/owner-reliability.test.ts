// Owner reports count less than a technician's confirmation. With reliability r an owner report
// uses P'(e|c) = r·P(e|c) + (1 − r)·P(e), P(e) being the chance of the report before any evidence.
import { describe, expect, it } from "vitest";
import { DEFAULT_OWNER_RELIABILITY, rankCauses, type Model } from "~/reasoning";

// Two equally likely causes, no unlisted share; P(noise | A) = .8, P(noise | B) = .2.
const model: Model = {
  causes: [
    { id: "A", prior: 1 },
    { id: "B", prior: 1 },
  ],
  symptoms: [{ id: "noise", leak: 0.1 }],
  links: [
    { symptomId: "noise", causeId: "A", p: 0.8 },
    { symptomId: "noise", causeId: "B", p: 0.2 },
  ],
  checks: [],
};
const pA = (source: "owner" | "technician", present = true, options = {}) =>
  rankCauses(
    model,
    { observations: [{ symptomId: "noise", present, source }], findings: [] },
    { unlistedPrior: 0, ...options },
  ).causes.find((c) => c.id === "A")!.probability;

describe("owner reliability", () => {
  it("the default is 0.7", () => expect(DEFAULT_OWNER_RELIABILITY).toBe(0.7));

  it("technician report: full weight", () => {
    // .5 × .8 against .5 × .2 → .8
    expect(pA("technician")).toBeCloseTo(0.8, 14);
  });

  it("owner report with r = .7: hand value", () => {
    // P(noise) = .5 × .8 + .5 × .2 = .5
    // P'(noise | A) = .7 × .8 + .3 × .5 = .71; P'(noise | B) = .7 × .2 + .3 × .5 = .29 → P(A) = .71
    expect(pA("owner")).toBeCloseTo(0.71, 14);
  });

  it("an owner report moves the ranking less than a technician's, in both directions", () => {
    expect(pA("owner")).toBeGreaterThan(0.5);
    expect(pA("owner")).toBeLessThan(pA("technician"));
    // absent: technician .5 × .2 / (.5 × .2 + .5 × .8) = .2; owner (.7 × .2 + .3 × .5) = .29 → .29
    expect(pA("technician", false)).toBeCloseTo(0.2, 14);
    expect(pA("owner", false)).toBeCloseTo(0.29, 14);
  });

  it("r = 1 is a technician's report; r = 0 ignores the owner", () => {
    expect(pA("owner", true, { ownerReliability: 1 })).toBeCloseTo(0.8, 14);
    expect(pA("owner", true, { ownerReliability: 0 })).toBeCloseTo(0.5, 14);
  });

  it("an owner's 'no' cannot rule out a cause that always shows the symptom", () => {
    // P(noise | A) = 1: a technician's 'absent' rules A out; the owner's only lowers it.
    const sure: Model = { ...model, links: [{ symptomId: "noise", causeId: "A", p: 1 }, model.links[1]] };
    const obs = (source: "owner" | "technician") =>
      rankCauses(
        sure,
        { observations: [{ symptomId: "noise", present: false, source }], findings: [] },
        { unlistedPrior: 0 },
      ).causes.find((c) => c.id === "A")!.probability;
    expect(obs("technician")).toBe(0);
    expect(obs("owner")).toBeGreaterThan(0);
  });

  it("a technician's confirmation replaces the owner's report of the same symptom", () => {
    const both = rankCauses(
      model,
      {
        observations: [
          { symptomId: "noise", present: true, source: "owner" },
          { symptomId: "noise", present: false, source: "technician" },
        ],
        findings: [],
      },
      { unlistedPrior: 0 },
    );
    expect(both.causes.find((c) => c.id === "A")!.probability).toBeCloseTo(0.2, 14);
    expect(Object.keys(both.causes[0].contributions)).toEqual(["symptom:noise"]);
  });
});
