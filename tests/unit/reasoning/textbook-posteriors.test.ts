// Exact posteriors on small cases computed by hand. With unlistedPrior 0 the engine is plain
// naive Bayes, P(C | e₁…eₙ) = α P(C) Π P(eᵢ | C) (Russell & Norvig, Artificial Intelligence:
// A Modern Approach, ch. 13), so the textbook figures must come out to floating-point precision.
import { describe, expect, it } from "vitest";
import { rankCauses } from "~/reasoning";
import { dentist } from "./reference/dentist";
import { leaky } from "./reference/leaky";

const prob = (r: ReturnType<typeof rankCauses>, id: string) => r.causes.find((c) => c.id === id)!.probability;

// Russell & Norvig ch. 13, full joint over cavity / toothache / catch:
//                 toothache          ¬toothache
//               catch   ¬catch     catch   ¬catch
//   cavity      .108    .012       .072    .008
//   ¬cavity     .016    .064       .144    .576
// As a two-cause model (each cause a leaf, every symptom linked to both, so leaks play no part):
//   P(cavity) = .108+.012+.072+.008 = .2;      P(¬cavity) = .8
//   P(toothache | cavity) = (.108+.012)/.2 = .6;  P(toothache | ¬cavity) = (.016+.064)/.8 = .1
//   P(catch | cavity)     = (.108+.072)/.2 = .9;  P(catch | ¬cavity)     = (.016+.144)/.8 = .2
// The table makes toothache and catch independent given cavity (.108/.2 = .54 = .6 × .9;
// .016/.8 = .02 = .1 × .2), which is the engine's assumption, so the answers are exact.
const exact = { unlistedPrior: 0 };

describe("Russell & Norvig ch. 13 dentist example", () => {
  it("P(cavity | toothache) = 0.6", () => {
    // .2 × .6 = .12 against .8 × .1 = .08 → .12 / .20 = 0.6 (the book's value)
    const r = rankCauses(
      dentist,
      { observations: [{ symptomId: "toothache", present: true }], findings: [] },
      exact,
    );
    expect(prob(r, "cavity")).toBeCloseTo(0.6, 14);
    expect(prob(r, "no-cavity")).toBeCloseTo(0.4, 14);
    expect(r.unlisted).toBe(0);
  });

  it("P(cavity | toothache ∧ catch) = .108 / .124 = 0.8710", () => {
    // .2 × .6 × .9 = .108 against .8 × .1 × .2 = .016 → .108 / .124 = 0.870967…
    const e = {
      observations: [
        { symptomId: "toothache", present: true },
        { symptomId: "catch", present: true },
      ],
      findings: [],
    };
    const r = rankCauses(dentist, e, exact);
    expect(prob(r, "cavity")).toBeCloseTo(0.108 / 0.124, 14);
    expect(prob(r, "cavity")).toBeCloseTo(0.871, 3);
    expect(r.causes[0].id).toBe("cavity");
  });

  it("P(cavity | ¬toothache) = .08 / .8 = 0.1 (derived from the same table)", () => {
    // absent: .2 × (1 − .6) = .08 against .8 × (1 − .1) = .72 → .08 / .80 = 0.1;
    // the table's ¬toothache column gives the same: (.072 + .008) / (.072+.008+.144+.576) = .08/.8
    const r = rankCauses(
      dentist,
      { observations: [{ symptomId: "toothache", present: false }], findings: [] },
      exact,
    );
    expect(prob(r, "cavity")).toBeCloseTo(0.1, 14);
  });

  it("order of the evidence does not change the posterior", () => {
    const a = rankCauses(
      dentist,
      {
        observations: [
          { symptomId: "catch", present: true },
          { symptomId: "toothache", present: true },
        ],
        findings: [],
      },
      exact,
    );
    expect(prob(a, "cavity")).toBeCloseTo(0.108 / 0.124, 14);
  });
});

// The hand case with a leak, an unlisted share and a check: ./reference/leaky.ts.
describe("hand-computed case with leak and 'not in the knowledge base'", () => {
  it("symptom present", () => {
    // A .6 × .8 = .48; B .3 × .1 = .03; U .1 × .1 = .01; Z = .52
    // → A = 12/13, B = 3/52, U = 1/52
    const r = rankCauses(
      leaky,
      { observations: [{ symptomId: "s", present: true }], findings: [] },
      { unlistedPrior: 0.1 },
    );
    expect(prob(r, "A")).toBeCloseTo(12 / 13, 14);
    expect(prob(r, "B")).toBeCloseTo(3 / 52, 14);
    expect(r.unlisted).toBeCloseTo(1 / 52, 14);
  });

  it("symptom present and the check fails", () => {
    // A .48 × .9 = .432; B .03 × .2 = .006; U .01 × .2 = .002; Z = .44
    // → A = 54/55, B = 3/220, U = 1/220
    const e = {
      observations: [{ symptomId: "s", present: true }],
      findings: [{ checkId: "k", result: "fail" as const }],
    };
    const r = rankCauses(leaky, e, { unlistedPrior: 0.1 });
    expect(prob(r, "A")).toBeCloseTo(54 / 55, 14);
    expect(prob(r, "B")).toBeCloseTo(3 / 220, 14);
    expect(r.unlisted).toBeCloseTo(1 / 220, 14);
  });

  it("the check passes", () => {
    // A .6 × .1 = .06; B .3 × .8 = .24; U .1 × .8 = .08; Z = .38 → A = 3/19, B = 12/19, U = 4/19
    const r = rankCauses(
      leaky,
      { observations: [], findings: [{ checkId: "k", result: "pass" }] },
      { unlistedPrior: 0.1 },
    );
    expect(prob(r, "A")).toBeCloseTo(3 / 19, 14);
    expect(prob(r, "B")).toBeCloseTo(12 / 19, 14);
    expect(r.unlisted).toBeCloseTo(4 / 19, 14);
    expect(r.causes.map((c) => c.id)).toEqual(["B", "A"]);
  });

  it("no evidence: the priors, with the default unlisted share of 0.05", () => {
    // A = .95 × 2/3, B = .95 × 1/3, U = .05
    const r = rankCauses(leaky, { observations: [], findings: [] });
    expect(prob(r, "A")).toBeCloseTo(0.95 * (2 / 3), 14);
    expect(prob(r, "B")).toBeCloseTo(0.95 / 3, 14);
    expect(r.unlisted).toBeCloseTo(0.05, 14);
    expect(r.causes[0].prior).toBeCloseTo(0.95 * (2 / 3), 14);
  });
});

// Noisy-OR (Pearl 1988) is not used: the model is single-fault, so no case combines causes.
