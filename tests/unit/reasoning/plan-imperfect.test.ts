// Plans with imperfect checks (false alarms, P(fail | cause) < 1) and an unlisted share. The
// plan stops at the first check that finds the fault (fails because of a cause it bears on); a
// false alarm finds nothing and the search goes on, so step i is reached unless an earlier check
// found the fault:
//   P(reach i) = Σ_h P(h) · Π_{j<i} (1 − d_j(h)),  d_j(h) = q_j(h) if check j bears on h, else 0,
//   ECR = Σ_i C_i · P(reach i).
import { describe, expect, it } from "vitest";
import { orderCost, planChecks, type Model } from "~/reasoning";
import { mulberry32 } from "./reference/prng";

describe("imperfect checks", () => {
  // P(A) = .6, P(B) = .3, P(U) = .1 (unlistedPrior .1, bases 2 : 1)
  // k1 (cost 10): fails .9 on A, false alarm .2;  k2 (cost 30): fails .8 on B, false alarm .05
  const model: Model = {
    causes: [
      { id: "A", prior: 2 },
      { id: "B", prior: 1 },
    ],
    symptoms: [],
    links: [],
    checks: [
      { id: "k1", cost: 10, falseAlarm: 0.2, bears: [{ causeId: "A", pFail: 0.9 }] },
      { id: "k2", cost: 30, falseAlarm: 0.05, bears: [{ causeId: "B", pFail: 0.8 }] },
    ],
  };
  const none = { observations: [], findings: [] };

  it("the chance of finding the fault counts only the causes a check bears on (hand values)", () => {
    // k1: P(A) × .9 = .6 × .9 = .54 → ratio .054   (its false alarms, .3 × .2 + .1 × .2, find nothing)
    // k2: P(B) × .8 = .3 × .8 = .24 → ratio .008
    const plan = planChecks(model, none, { unlistedPrior: 0.1 });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["k1", "k2"]);
    expect(plan.steps[0].pFind).toBeCloseTo(0.54, 14);
    expect(plan.steps[1].pFind).toBeCloseTo(0.24, 14);
    expect(plan.steps[1].ratio).toBeCloseTo(0.24 / 30, 14);
  });

  it("a cheap check with a high false-alarm rate does not jump ahead of a relevant one", () => {
    // k3 bears on nothing likely (B' with prior 0) and fails 30% of the time by false alarm.
    // By P(fail) it would score .3 / 5 = .06 and lead; by detection it scores 0 and comes last.
    const m: Model = {
      ...model,
      causes: [...model.causes, { id: "C", prior: 0 }],
      checks: [...model.checks, { id: "k3", cost: 5, falseAlarm: 0.3, bears: [{ causeId: "C", pFail: 1 }] }],
    };
    const plan = planChecks(m, none, { unlistedPrior: 0.1 });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["k1", "k2", "k3"]);
    expect(plan.steps[2].pFind).toBe(0);
  });

  it("ECR: step 2 is reached unless k1 found the fault; its false alarms find nothing", () => {
    // P(k1 finds it) = P(A) × .9 = .54 → step 2 reached with 1 − .54 = .46 → ECR = 10 + .46 × 30 = 23.8
    // other order: P(k2 finds it) = P(B) × .8 = .24 → 30 + .76 × 10 = 37.6
    const plan = planChecks(model, none, { unlistedPrior: 0.1 });
    expect(plan.expectedCost).toBeCloseTo(23.8, 12);
    expect(plan.steps[1].pReached).toBeCloseTo(0.46, 14);
    expect(orderCost(model, none, ["k2", "k1"], { unlistedPrior: 0.1 })).toBeCloseTo(37.6, 12);
  });

  it("ECR equals the formula summed over hypotheses, on random imperfect instances", () => {
    const rand = mulberry32(95);
    for (let t = 0; t < 50; t++) {
      const n = 2 + Math.floor(rand() * 5);
      const causes = Array.from({ length: n }, (_, i) => ({ id: `c${i}`, prior: rand() + 0.1 }));
      const checks = Array.from({ length: n + 1 }, (_, i) => ({
        id: `k${i}`,
        cost: 1 + Math.round(rand() * 50),
        falseAlarm: rand() * 0.3,
        bears: [{ causeId: `c${Math.floor(rand() * n)}`, pFail: 0.5 + rand() / 2 }],
      }));
      const m: Model = { causes, symptoms: [], links: [], checks };
      const u = 0.05;
      const plan = planChecks(m, { observations: [], findings: [] }, { unlistedPrior: u });
      // Independent computation: hypotheses c0..c(n−1) and U, survival products written out.
      const total = causes.reduce((s, c) => s + c.prior, 0);
      const hyps = [...causes.map((c) => ({ id: c.id, p: ((1 - u) * c.prior) / total })), { id: "U", p: u }];
      const q = (checkId: string, h: string) => {
        const k = checks.find((x) => x.id === checkId)!;
        return k.bears.find((b) => b.causeId === h)?.pFail ?? 0; // a false alarm finds nothing
      };
      let expected = 0;
      for (const h of hyps) {
        let reach = h.p;
        for (const s of plan.steps) {
          expected += s.cost * reach;
          reach *= 1 - q(s.checkId, h.id);
        }
      }
      expect(plan.expectedCost).toBeCloseTo(expected, 9);
    }
  });

  it("a check that always fails (false alarm 1) still finds only the cause it bears on", () => {
    // k0 fails surely unless the fault is A (then it fails with .5). P(A) = .5 of listed, U = 0.
    const m: Model = {
      causes: [
        { id: "A", prior: 1 },
        { id: "B", prior: 1 },
      ],
      symptoms: [],
      links: [],
      checks: [
        { id: "k0", cost: 1, falseAlarm: 1, bears: [{ causeId: "A", pFail: 0.5 }] },
        { id: "k1", cost: 100, falseAlarm: 0, bears: [{ causeId: "B", pFail: 1 }] },
      ],
    };
    // k0 first (detection .5 × .5 = .25 per 1, against k1's .5 per 100); P(k0 finds it) = .25
    // → ECR = 1 + .75 × 100 = 76; the other order costs 100 + (1 − .5) × 1 = 100.5
    const plan = planChecks(m, { observations: [], findings: [] }, { unlistedPrior: 0 });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["k0", "k1"]);
    expect(plan.expectedCost).toBeCloseTo(76, 12);
    expect(orderCost(m, { observations: [], findings: [] }, ["k1", "k0"], { unlistedPrior: 0 })).toBeCloseTo(
      100.5,
      12,
    );
  });

  it("when the fault is outside the knowledge base, no check can find it", () => {
    // Evidence rules out every listed cause (P(s | A) = 0, s present, leak .3): only U is left.
    const m: Model = {
      ...model,
      symptoms: [{ id: "s", leak: 0.3 }],
      links: [
        { symptomId: "s", causeId: "A", p: 0 },
        { symptomId: "s", causeId: "B", p: 0 },
      ],
    };
    const plan = planChecks(m, { observations: [{ symptomId: "s", present: true }], findings: [] });
    // Each would fail only by false alarm (k1 .2, k2 .05), which finds nothing: both score 0,
    // and equal chances fall back to cheapest first.
    expect(plan.steps.map((s) => [s.checkId, s.pFind])).toEqual([
      ["k1", 0],
      ["k2", 0],
    ]);
  });
});
