// The plan is never worse than cheapest-first: the value order (P(find) / cost) is improved by
// neighbour swaps where the ratio rule's assumptions do not hold (checks bearing on several causes,
// imperfect or redundant checks), and cheapest-first improved the same way is shown if that still
// costs less. Checked against brute force over every order on small random instances.
import { describe, expect, it } from "vitest";
import { orderCost, planChecks, type Model } from "~/reasoning";
import { mulberry32 } from "./reference/prng";

const none = { observations: [], findings: [] };

/** ECR by the textbook sum over hypotheses (Heckerman, Breese & Rommelse 1995); a false alarm finds nothing. */
function ecrOf(model: Model, order: string[], unlisted: number): number {
  const total = model.causes.reduce((s, c) => s + c.prior, 0);
  const hyps = [
    ...model.causes.map((c) => ({ id: c.id as string | null, p: ((1 - unlisted) * c.prior) / total })),
    { id: null, p: unlisted },
  ];
  let ecr = 0;
  for (const h of hyps) {
    let reach = h.p;
    for (const id of order) {
      const k = model.checks.find((c) => c.id === id)!;
      ecr += k.cost * reach;
      reach *= 1 - (k.bears.find((b) => b.causeId === h.id)?.pFail ?? 0);
    }
  }
  return ecr;
}

function permutations<T>(xs: T[]): T[][] {
  if (xs.length <= 1) return [xs];
  return xs.flatMap((x, i) => permutations([...xs.slice(0, i), ...xs.slice(i + 1)]).map((p) => [x, ...p]));
}

describe("a plan never worse than cheapest-first", () => {
  it("redundant checks: the second check on the same cause goes last (hand values)", () => {
    // A and B equally likely, no unlisted share. k1 (10) and k2 (11) both find A surely; k3 (12) finds B.
    // Ratios .05, .0455, .0417 put k2 second, where it can find nothing k1 missed:
    //   k1 k2 k3: 10 + .5·11 + .5·12 = 21.5 (also cheapest-first)
    //   k1 k3 k2: 10 + .5·12 + 0·11 = 16 (the minimum of the six orders)
    const m: Model = {
      causes: [
        { id: "A", prior: 1 },
        { id: "B", prior: 1 },
      ],
      symptoms: [],
      links: [],
      checks: [
        { id: "k1", cost: 10, falseAlarm: 0, bears: [{ causeId: "A", pFail: 1 }] },
        { id: "k2", cost: 11, falseAlarm: 0, bears: [{ causeId: "A", pFail: 1 }] },
        { id: "k3", cost: 12, falseAlarm: 0, bears: [{ causeId: "B", pFail: 1 }] },
      ],
    };
    const plan = planChecks(m, none, { unlistedPrior: 0 });
    expect(plan.steps.map((s) => s.checkId)).toEqual(["k1", "k3", "k2"]);
    expect(plan.expectedCost).toBeCloseTo(16, 12);
    expect(plan.cheapestFirstExpectedCost).toBeCloseTo(21.5, 12);
    expect(plan.saving).toBeCloseTo(5.5, 12);
    expect(plan.order).toBe("value");
  });

  it("300 random small instances: plan ≤ cheapest-first, ≥ the brute-force optimum, saving = the true difference", () => {
    const rand = mulberry32(14_2026);
    let improvedOnRatio = 0;
    for (let t = 0; t < 300; t++) {
      const nCauses = 2 + Math.floor(rand() * 4);
      const nChecks = 2 + Math.floor(rand() * 5); // up to 6 checks: 720 orders
      const causes = Array.from({ length: nCauses }, (_, i) => ({ id: `c${i}`, prior: 0.1 + rand() }));
      const checks = Array.from({ length: nChecks }, (_, i) => ({
        id: `k${i}`,
        cost: 1 + Math.round(rand() * 40),
        falseAlarm: Math.round(rand() * 30) / 100,
        bears: causes.filter(() => rand() < 0.5).map((c) => ({ causeId: c.id, pFail: 0.2 + 0.8 * rand() })),
      }));
      const model: Model = { causes, symptoms: [], links: [], checks };
      const u = rand() < 0.5 ? 0 : 0.1;
      const plan = planChecks(model, none, { unlistedPrior: u });
      const order = plan.steps.map((s) => s.checkId);
      const best = Math.min(...permutations(checks.map((c) => c.id)).map((p) => ecrOf(model, p, u)));
      const cheapest = [...checks].sort((a, b) => a.cost - b.cost || (a.id < b.id ? -1 : 1)).map((c) => c.id);
      expect(plan.expectedCost).toBeCloseTo(ecrOf(model, order, u), 9);
      expect(plan.expectedCost).toBeCloseTo(orderCost(model, none, order, { unlistedPrior: u }), 9);
      expect(plan.cheapestFirstExpectedCost).toBeCloseTo(ecrOf(model, cheapest, u), 9);
      expect(plan.expectedCost).toBeLessThanOrEqual(plan.cheapestFirstExpectedCost + 1e-9);
      expect(plan.expectedCost).toBeGreaterThanOrEqual(best - 1e-9);
      expect(plan.saving).toBeCloseTo(plan.cheapestFirstExpectedCost - plan.expectedCost, 12);
      expect(plan.saving).toBeGreaterThanOrEqual(0);
      // the plain ratio order, for counting how often the swaps mattered
      const ratio = [...plan.steps]
        .sort((a, b) => b.ratio - a.ratio || a.cost - b.cost || (a.checkId < b.checkId ? -1 : 1))
        .map((s) => s.checkId);
      if (ecrOf(model, ratio, u) > plan.expectedCost + 1e-9) improvedOnRatio++;
    }
    // the random instances do include orders the ratio rule gets wrong
    expect(improvedOnRatio).toBeGreaterThan(0);
  });
});
