// The cause tree: leaves are the candidates, a node's share is the sum of its leaves, and a link
// or check attached to a node applies to every leaf below it unless a nearer one overrides it.
import { describe, expect, it } from "vitest";
import { planChecks, rankCauses, type Model } from "~/reasoning";

// brakes ─┬─ discs ─┬─ warped (base 1)
//         │         └─ worn (base 1)
//         └─ pads ──── glazed (base 2)
const tree = (links: Model["links"], checks: Model["checks"] = []): Model => ({
  causes: [
    { id: "brakes", prior: 0 },
    { id: "discs", parentId: "brakes", prior: 0 },
    { id: "pads", parentId: "brakes", prior: 0 },
    { id: "warped", parentId: "discs", prior: 1 },
    { id: "worn", parentId: "discs", prior: 1 },
    { id: "glazed", parentId: "pads", prior: 2 },
  ],
  symptoms: [{ id: "judder", leak: 0.05 }],
  links,
  checks,
});
const judder = { observations: [{ symptomId: "judder", present: true }], findings: [] };
const p = (r: ReturnType<typeof rankCauses>, id: string) => r.causes.find((c) => c.id === id)!.probability;

describe("cause tree", () => {
  it("only leaves are ranked; nodes get the sum of their leaves", () => {
    const r = rankCauses(tree([]), { observations: [], findings: [] }, { unlistedPrior: 0 });
    expect(r.causes.map((c) => c.id).sort()).toEqual(["glazed", "warped", "worn"]);
    // priors 1 : 1 : 2 → .25, .25, .5; discs = .5, pads = .5, brakes = 1
    expect(r.nodes).toEqual({ discs: 0.5, pads: 0.5, brakes: 1 });
  });

  it("a link on a node applies to each leaf below it", () => {
    // judder | discs = .8 for warped and worn; glazed uses the leak .05
    // warped .25 × .8 = .2, worn .2, glazed .5 × .05 = .025; Z = .425
    const r = rankCauses(tree([{ symptomId: "judder", causeId: "discs", p: 0.8 }]), judder, {
      unlistedPrior: 0,
    });
    expect(p(r, "warped")).toBeCloseTo(0.2 / 0.425, 14);
    expect(p(r, "worn")).toBeCloseTo(0.2 / 0.425, 14);
    expect(p(r, "glazed")).toBeCloseTo(0.025 / 0.425, 14);
    expect(r.nodes.discs).toBeCloseTo(0.4 / 0.425, 14);
  });

  it("the nearest link wins: a leaf's own figure overrides its parent's", () => {
    // discs .8, but warped itself .95: warped .25 × .95 = .2375, worn .2, glazed .025; Z = .4625
    const r = rankCauses(
      tree([
        { symptomId: "judder", causeId: "discs", p: 0.8 },
        { symptomId: "judder", causeId: "warped", p: 0.95 },
      ]),
      judder,
      { unlistedPrior: 0 },
    );
    expect(p(r, "warped")).toBeCloseTo(0.2375 / 0.4625, 14);
    expect(p(r, "worn")).toBeCloseTo(0.2 / 0.4625, 14);
  });

  it("a check on a node bears on every leaf below it", () => {
    // Perfect check on discs: P(fail) = P(warped) + P(worn) = .5
    const checks = [
      { id: "measure-runout", cost: 10, falseAlarm: 0, bears: [{ causeId: "discs", pFail: 1 }] },
    ];
    const plan = planChecks(tree([], checks), { observations: [], findings: [] }, { unlistedPrior: 0 });
    expect(plan.steps[0].pFind).toBeCloseTo(0.5, 14);
    const after = rankCauses(
      tree([], checks),
      { observations: [], findings: [{ checkId: "measure-runout", result: "pass" }] },
      { unlistedPrior: 0 },
    );
    expect(p(after, "glazed")).toBeCloseTo(1, 14);
    expect(after.nodes.discs).toBe(0);
  });

  it("an inner node's own prior is ignored", () => {
    const m = tree([]);
    m.causes[1] = { ...m.causes[1], prior: 1000 };
    const r = rankCauses(m, { observations: [], findings: [] }, { unlistedPrior: 0 });
    expect(p(r, "glazed")).toBeCloseTo(0.5, 14);
  });
});
