// The plan's arithmetic is bounded for every valid model. A check with false-alarm rate 1 fails
// unless one of its own causes is present; an expected cost that let false alarms end the search
// had to rescale every hypothesis at each such check (O(K·H)): a what-if of 199,997 elements of
// that shape held the server for 32.5 s. A false alarm finds nothing, so a check changes only the
// leaves it bears on: O(H + Σ bearings) for any mix of false-alarm rates.
import { describe, expect, it } from "vitest";
import { orderCost, planChecks, type Model } from "~/reasoning";
import { mulberry32 } from "./reference/prng";

const none = { observations: [], findings: [] };

/** ECR by the textbook sum, over every hypothesis and every earlier step (Heckerman et al. 1995); a false alarm finds nothing. */
function bruteEcr(model: Model, order: string[], unlisted: number): number {
  const total = model.causes.reduce((s, c) => s + c.prior, 0);
  const hyps = [
    ...model.causes.map((c) => ({ id: c.id as string | null, p: ((1 - unlisted) * c.prior) / total })),
    { id: null, p: unlisted },
  ];
  const q = (checkId: string, h: string | null) => {
    const k = model.checks.find((c) => c.id === checkId)!;
    return k.bears.find((b) => b.causeId === h)?.pFail ?? 0;
  };
  let ecr = 0;
  order.forEach((id, i) => {
    const reach = hyps.reduce(
      (s, h) => s + h.p * order.slice(0, i).reduce((m, prev) => m * (1 - q(prev, h.id)), 1),
      0,
    );
    ecr += model.checks.find((c) => c.id === id)!.cost * reach;
  });
  return ecr;
}

describe("checks with false-alarm rate 1", () => {
  it("give the textbook expected cost in any mix with ordinary checks (random instances against brute force)", () => {
    const rand = mulberry32(20261202);
    for (let round = 0; round < 40; round++) {
      const causes = Array.from({ length: 6 }, (_, i) => ({ id: `c${i}`, prior: 0.2 + rand() }));
      const checks = Array.from({ length: 7 }, (_, i) => ({
        id: `k${i}`,
        cost: 1 + Math.floor(rand() * 50),
        // One check in three always fails unless its causes are there.
        falseAlarm: rand() < 0.35 ? 1 : Math.round(rand() * 20) / 100,
        bears: causes.filter(() => rand() < 0.4).map((c) => ({ causeId: c.id, pFail: 0.3 + 0.7 * rand() })),
      }));
      const model: Model = { causes, symptoms: [], links: [], checks };
      const order = checks.map((c) => c.id).sort(() => rand() - 0.5);
      expect(orderCost(model, none, order, { unlistedPrior: 0.05 })).toBeCloseTo(
        bruteEcr(model, order, 0.05),
        9,
      );
    }
  });

  it("plan 40,000 checks over 40,000 causes in a fraction of the time the O(K·H) sum needed", () => {
    // The shape of the freezing request: every check fails by false alarm and bears on nothing.
    // The old sum did K × H = 1.6e9 multiply-adds here (several seconds on this machine); the bound
    // below is ten times what the linear pass needs on a slow machine, so it tests the complexity,
    // not the speed of the box (common practice for complexity tests, no published source).
    const n = 40_000;
    const model: Model = {
      causes: Array.from({ length: n }, (_, i) => ({ id: `c${i}`, prior: 1 })),
      symptoms: [],
      links: [],
      checks: Array.from({ length: n }, (_, i) => ({
        id: `k${i}`,
        cost: 1 + (i % 7),
        falseAlarm: 1,
        bears: [],
      })),
    };
    const started = performance.now();
    const plan = planChecks(model, none);
    const ms = performance.now() - started;
    expect(plan.steps).toHaveLength(n);
    // No check bears on anything, so none can find the fault: every step is reached and paid for.
    // (1 up to the rounding of 40,000 priors of 1/40,000 each)
    expect(plan.steps[1].pReached).toBeCloseTo(1, 9);
    const all = plan.steps.reduce((s, x) => s + x.cost, 0);
    expect(plan.expectedCost / all).toBeCloseTo(1, 9);
    expect(ms).toBeLessThan(2_000);
  });
});
