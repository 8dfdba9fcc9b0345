// Check ordering. With one perfect check per cause (fails exactly when its cause is the fault),
// running checks in decreasing p/c order minimises the expected cost
//   ECR = Σ_i C_i · (1 − Σ_{j<i} p_j)
// (Kadane & Simon, Annals of Statistics 5(2), 1977; Heckerman, Breese & Rommelse, CACM 38(3), 1995).
import { describe, expect, it } from "vitest";
import { orderCost, planChecks, type Model } from "~/reasoning";
import { mulberry32 } from "./reference/prng";

const none = { observations: [], findings: [] };
const exact = { unlistedPrior: 0 };

/** One cause per entry, each with a perfect check "check-<id>" of the given cost. */
function perfectChecks(entries: { id: string; p: number; cost: number }[]): Model {
  return {
    causes: entries.map((e) => ({ id: e.id, prior: e.p })),
    symptoms: [],
    links: [],
    checks: entries.map((e) => ({
      id: `check-${e.id}`,
      cost: e.cost,
      falseAlarm: 0,
      bears: [{ causeId: e.id, pFail: 1 }],
    })),
  };
}

// The textbook formula, written out independently of the engine.
function ecrByFormula(order: { p: number; cost: number }[]): number {
  let notFound = 1;
  let total = 0;
  for (const s of order) {
    total += s.cost * notFound;
    notFound -= s.p;
  }
  return total;
}

function* permutations<T>(xs: T[]): Generator<T[]> {
  if (xs.length <= 1) return yield xs;
  for (let i = 0; i < xs.length; i++)
    for (const rest of permutations([...xs.slice(0, i), ...xs.slice(i + 1)])) yield [xs[i], ...rest];
}

describe("ordering theorem (brute force over all orders)", () => {
  it("200 random instances of 2–7 perfect checks: the plan's ECR is the minimum", () => {
    const rand = mulberry32(1977);
    for (let t = 0; t < 200; t++) {
      const n = 2 + Math.floor(rand() * 6);
      const raw = Array.from({ length: n }, () => rand() + 0.01);
      const sum = raw.reduce((a, b) => a + b, 0);
      const entries = raw.map((r, i) => ({ id: `c${i}`, p: r / sum, cost: 1 + Math.round(rand() * 99) }));
      let best = Infinity;
      for (const order of permutations(entries)) best = Math.min(best, ecrByFormula(order));
      const plan = planChecks(perfectChecks(entries), none, exact);
      expect(plan.steps).toHaveLength(n);
      expect(plan.expectedCost).toBeCloseTo(best, 9);
      // and the engine's ECR of its own order is the textbook formula for that order
      const byId = new Map(entries.map((e) => [`check-${e.id}`, e]));
      expect(plan.expectedCost).toBeCloseTo(ecrByFormula(plan.steps.map((s) => byId.get(s.checkId)!)), 9);
      expect(plan.cheapestFirstExpectedCost).toBeGreaterThanOrEqual(plan.expectedCost - 1e-9);
    }
  });
});

describe("worked vectors", () => {
  // A (p .5, c 40), B (.3, 10), C (.2, 20); ECR by order, derived by brute force:
  //   BAC 10 + .7·40 + .2·20 = 42 (optimum, the p/c order: .03, .0125, .01)
  //   BCA 10 + .7·20 + .5·40 = 44 (also cheapest first)
  //   CBA 20 + .8·10 + .5·40 = 48;  ABC 40 + .5·10 + .2·20 = 49
  //   ACB 40 + .5·20 + .3·10 = 53;  CAB 20 + .8·40 + .3·10 = 55
  const abc = perfectChecks([
    { id: "A", p: 0.5, cost: 40 },
    { id: "B", p: 0.3, cost: 10 },
    { id: "C", p: 0.2, cost: 20 },
  ]);
  it("three checks: plan BAC, ECR 42 against cheapest-first 44", () => {
    const plan = planChecks(abc, none, exact);
    expect(plan.steps.map((s) => s.checkId)).toEqual(["check-B", "check-A", "check-C"]);
    expect(plan.expectedCost).toBeCloseTo(42, 12);
    expect(plan.cheapestFirstExpectedCost).toBeCloseTo(44, 12);
    expect(plan.saving).toBeCloseTo(2, 12);
    expect(plan.steps.map((s) => s.pFind)).toEqual([
      expect.closeTo(0.3, 12),
      expect.closeTo(0.5, 12),
      expect.closeTo(0.2, 12),
    ]);
    expect(plan.steps.map((s) => s.ratio)).toEqual([
      expect.closeTo(0.03, 12),
      expect.closeTo(0.0125, 12),
      expect.closeTo(0.01, 12),
    ]);
    // the last step counts, weighted by P(not found before it) = .2
    expect(plan.steps.map((s) => s.pReached)).toEqual([1, expect.closeTo(0.7, 12), expect.closeTo(0.2, 12)]);
  });

  it("three checks: every order's ECR", () => {
    const expected: Record<string, number> = { BAC: 42, BCA: 44, CBA: 48, ABC: 49, ACB: 53, CAB: 55 };
    for (const [order, ecr] of Object.entries(expected)) {
      expect(
        orderCost(
          abc,
          none,
          [...order].map((c) => `check-${c}`),
          exact,
        ),
      ).toBeCloseTo(ecr, 12);
    }
  });

  it("two causes, p = .6, C₁ = 30, C₂ = 10: cause 2 first", () => {
    // p/C₁ = .02 < (1 − p)/C₂ = .04 → check 2 first: 10 + .6·30 = 28, against 30 + .4·10 = 34
    const m = perfectChecks([
      { id: "1", p: 0.6, cost: 30 },
      { id: "2", p: 0.4, cost: 10 },
    ]);
    const plan = planChecks(m, none, exact);
    expect(plan.steps.map((s) => s.checkId)).toEqual(["check-2", "check-1"]);
    expect(plan.expectedCost).toBeCloseTo(28, 12);
    expect(orderCost(m, none, ["check-1", "check-2"], exact)).toBeCloseTo(34, 12);
  });
});

describe("special cases and ties", () => {
  it("equal chances: plain cheapest first", () => {
    const m = perfectChecks([
      { id: "x", p: 1, cost: 30 },
      { id: "y", p: 1, cost: 5 },
      { id: "z", p: 1, cost: 12 },
      { id: "w", p: 1, cost: 50 },
    ]);
    const plan = planChecks(m, none, exact);
    expect(plan.steps.map((s) => s.cost)).toEqual([5, 12, 30, 50]);
    expect(plan.expectedCost).toBeCloseTo(plan.cheapestFirstExpectedCost, 12);
  });

  it("equal costs: most likely first", () => {
    const m = perfectChecks([
      { id: "x", p: 0.1, cost: 20 },
      { id: "y", p: 0.5, cost: 20 },
      { id: "z", p: 0.3, cost: 20 },
      { id: "w", p: 0.1, cost: 20 },
    ]);
    expect(planChecks(m, none, exact).steps.map((s) => s.checkId)).toEqual([
      "check-y",
      "check-z",
      "check-w",
      "check-x",
    ]);
  });

  it("equal ratios: cheaper first, then by id", () => {
    // .3/10 = .6/20 = .03 on paper; equal ratio and cost: id order (a before b).
    const m = perfectChecks([
      { id: "big", p: 0.6, cost: 20 },
      { id: "small", p: 0.3, cost: 10 },
      { id: "b", p: 0.05, cost: 10 },
      { id: "a", p: 0.05, cost: 10 },
    ]);
    expect(planChecks(m, none, exact).steps.map((s) => s.checkId)).toEqual([
      "check-small",
      "check-big",
      "check-a",
      "check-b",
    ]);
  });

  it("recorded checks leave the plan; the rest is re-ordered by the new posterior", () => {
    const abc = perfectChecks([
      { id: "A", p: 0.5, cost: 40 },
      { id: "B", p: 0.3, cost: 10 },
      { id: "C", p: 0.2, cost: 20 },
    ]);
    // B passed: A = .5/.7, C = .2/.7 → ratios .0179, .0143 → A then C; ECR 40 + (2/7)·20
    const plan = planChecks(
      abc,
      { observations: [], findings: [{ checkId: "check-B", result: "pass" }] },
      exact,
    );
    expect(plan.steps.map((s) => s.checkId)).toEqual(["check-A", "check-C"]);
    expect(plan.expectedCost).toBeCloseTo(40 + (2 / 7) * 20, 12);
  });
});
