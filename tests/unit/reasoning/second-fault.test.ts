// Several faults at once: after a cause is confirmed, the evidence it explains is set aside and
// the rest is ranked as a second fault. Hand values by Bayes' rule (Russell & Norvig, AIMA ch. 13).
import { describe, expect, it } from "vitest";
import { rankCauses, rankSecondFault, type ReasoningError, type Model } from "~/reasoning";

// A warped disc (A) and a worn wheel bearing (B) on one car, C an innocent third cause; equal priors.
// s1 "judder under braking" shows with A .9; s2 "hum that rises with speed" with B .8 and with A
// now and then (.1); kA (the dial gauge) finds A .95; kB (rock and spin) finds B .9; s3 shows with C.
const model: Model = {
  causes: [
    { id: "A", prior: 1 },
    { id: "B", prior: 1 },
    { id: "C", prior: 1 },
  ],
  symptoms: [
    { id: "s1", leak: 0.02 },
    { id: "s2", leak: 0.02 },
    { id: "s3", leak: 0.02 },
  ],
  links: [
    { symptomId: "s1", causeId: "A", p: 0.9 },
    { symptomId: "s2", causeId: "B", p: 0.8 },
    { symptomId: "s2", causeId: "A", p: 0.1 },
    { symptomId: "s3", causeId: "C", p: 0.7 },
  ],
  checks: [
    { id: "kA", cost: 30, falseAlarm: 0.05, bears: [{ causeId: "A", pFail: 0.95 }] },
    { id: "kB", cost: 10, falseAlarm: 0.05, bears: [{ causeId: "B", pFail: 0.9 }] },
  ],
};
const evidence = {
  observations: [
    { symptomId: "s1", present: true },
    { symptomId: "s2", present: true },
    { symptomId: "s3", present: false },
  ],
  findings: [{ checkId: "kA", result: "fail" as const }],
};
const u = { unlistedPrior: 0 };

describe("second fault", () => {
  it("the single-fault ranking puts A first and absorbs B's evidence", () => {
    expect(rankCauses(model, evidence, u).causes[0].id).toBe("A");
  });

  it("sets aside what the confirmed cause explains, keeps what another cause explains better and every absence", () => {
    const second = rankSecondFault(model, evidence, ["A"], u);
    // s1 (A .9 against leaks .02) and kA (.95 against .05) go; s2 stays (B .8 beats A's .1); s3 absent stays
    expect(second.setAside).toEqual(["symptom:s1", "check:kA"]);
    expect(second.kept.observations.map((o) => o.symptomId)).toEqual(["s2", "s3"]);
    expect(second.kept.findings).toEqual([]);
  });

  it("ranks the rest as a second fault (hand values)", () => {
    // without A, B and C share the prior: .5 each. s2 present: B .8, C .02; s3 absent: B .98, C .3
    // B .5·.8·.98 = .392, C .5·.02·.3 = .003 → P(B) = .392 / .395 = .992405
    const second = rankSecondFault(model, evidence, ["A"], u);
    expect(second.ranking.causes.map((c) => c.id)).toEqual(["B", "C"]);
    expect(second.ranking.causes[0].probability).toBeCloseTo(0.392 / 0.395, 12);
    // the why still adds up: log odds(B) = log odds before + Σ contributions (prior odds .5/.5 = 1)
    const b = second.ranking.causes[0];
    const sum = Object.values(b.contributions).reduce((s, w) => s + w, 0);
    expect(Math.log(b.probability / (1 - b.probability))).toBeCloseTo(sum, 9);
  });

  it("plans the second fault's checks, leaving the done ones out", () => {
    const second = rankSecondFault(model, evidence, ["A"], u);
    expect(second.plan.steps.map((s) => s.checkId)).toEqual(["kB"]);
    expect(second.plan.steps[0].pFind).toBeCloseTo((0.392 / 0.395) * 0.9, 12);
  });

  it("keeps 'not in the knowledge base' as a candidate second fault, its prior scaled with the rest", () => {
    // priors A .3, B .3, C .3, U .1 → without A: B 3/7, C 3/7, U 1/7. U's figures: s2 max(.02, .04) = .04, s3 absent .96
    // B 3/7·.8·.98, C 3/7·.02·.3, U 1/7·.04·.96 → U = .0384 / (2.352 + .018 + .0384)
    const second = rankSecondFault(model, evidence, ["A"], { unlistedPrior: 0.1 });
    expect(second.ranking.unlisted).toBeCloseTo(0.0384 / (2.352 + 0.018 + 0.0384), 12);
  });

  it("refuses an unknown cause, a group of causes, or nothing to confirm", () => {
    const code = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as ReasoningError).code;
      }
      return "none";
    };
    expect(code(() => rankSecondFault(model, evidence, ["Z"]))).toBe("UNKNOWN_ID");
    expect(code(() => rankSecondFault(model, evidence, []))).toBe("INVALID_INPUT");
    const tree: Model = {
      ...model,
      causes: [{ id: "G", prior: 0 }, ...model.causes.map((c) => ({ ...c, parentId: "G" }))],
    };
    expect(code(() => rankSecondFault(tree, evidence, ["G"]))).toBe("INVALID_INPUT");
  });
});
