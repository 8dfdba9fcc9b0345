// "Not in the knowledge base" explains any symptom with a stated probability: P(s | U) =
// max(leak(s), ρ), or the symptom's own figure; absent 1 − that. So evidence the listed causes
// explain poorly raises it. Hand-computed against Bayes' rule (Russell & Norvig, AIMA ch. 13).
import { describe, expect, it } from "vitest";
import { rankCauses, whatIf, type Model } from "~/reasoning";

// A and B equally likely; s shows with A .6 (leak .02); k finds A .9 (false alarm .05).
const model: Model = {
  causes: [
    { id: "A", prior: 1 },
    { id: "B", prior: 1 },
  ],
  symptoms: [{ id: "s", leak: 0.02 }],
  links: [{ symptomId: "s", causeId: "A", p: 0.6 }],
  checks: [{ id: "k", cost: 10, falseAlarm: 0.05, bears: [{ causeId: "A", pFail: 0.9 }] }],
};
const opts = { unlistedPrior: 0.1, unlistedSymptomRate: 0.2 };
const prob = (r: ReturnType<typeof rankCauses>, id: string) => r.causes.find((c) => c.id === id)!.probability;

describe("none of these", () => {
  it("explains a present symptom with ρ, not only the leak (hand values)", () => {
    // priors A .45, B .45, U .1; likelihoods A .6, B .02 (leak), U max(.02, .2) = .2
    // .27, .009, .02 → Z = .299 → A .903010, B .030100, U .066890
    const r = rankCauses(model, { observations: [{ symptomId: "s", present: true }], findings: [] }, opts);
    expect(prob(r, "A")).toBeCloseTo(0.27 / 0.299, 12);
    expect(prob(r, "B")).toBeCloseTo(0.009 / 0.299, 12);
    expect(r.unlisted).toBeCloseTo(0.02 / 0.299, 12);
  });

  it("rises when a check clears the listed cause that explained the symptom (hand values)", () => {
    // then k passes: A × .1, B × .95, U × .95 → .027, .00855, .019 → Z = .05455 → U .348304
    const r = rankCauses(
      model,
      { observations: [{ symptomId: "s", present: true }], findings: [{ checkId: "k", result: "pass" }] },
      opts,
    );
    expect(r.unlisted).toBeCloseTo(0.019 / 0.05455, 12);
    expect(prob(r, "A")).toBeCloseTo(0.027 / 0.05455, 12);
    // with the leak alone (ρ = 0) U gets .1 × .02 × .95 = .0019 of Z .03745: .050734 — "none of these" stays silent
    const leakOnly = rankCauses(
      model,
      { observations: [{ symptomId: "s", present: true }], findings: [{ checkId: "k", result: "pass" }] },
      { ...opts, unlistedSymptomRate: 0 },
    );
    expect(leakOnly.unlisted).toBeCloseTo(0.0019 / 0.03745, 12);
  });

  it("counts an absent symptom as 1 − max(leak, ρ)", () => {
    // A .45 × .4 = .18, B .45 × .98 = .441, U .1 × .8 = .08 → Z = .701
    const r = rankCauses(model, { observations: [{ symptomId: "s", present: false }], findings: [] }, opts);
    expect(r.unlisted).toBeCloseTo(0.08 / 0.701, 12);
  });

  it("uses a symptom's own figure where it states one", () => {
    // unlisted .5: .27, .009, .05 → Z = .329
    const own: Model = { ...model, symptoms: [{ id: "s", leak: 0.02, unlisted: 0.5 }] };
    const r = rankCauses(own, { observations: [{ symptomId: "s", present: true }], findings: [] }, opts);
    expect(r.unlisted).toBeCloseTo(0.05 / 0.329, 12);
  });

  it("mixes an owner's report with U's figure too", () => {
    // r = .7; P(s) under the prior = .45·.6 + .45·.02 + .1·.2 = .299
    // A' = .7·.6 + .3·.299 = .5097, B' = .7·.02 + .0897 = .1037, U' = .7·.2 + .0897 = .2297
    // .229365, .046665, .02297 → Z = .299
    const r = rankCauses(
      model,
      { observations: [{ symptomId: "s", present: true, source: "owner" }], findings: [] },
      opts,
    );
    expect(r.unlisted).toBeCloseTo(0.02297 / 0.299, 12);
    expect(prob(r, "A")).toBeCloseTo(0.229365 / 0.299, 12);
  });

  it("leaves checks alone: under U a check fails only by false alarm (what-if)", () => {
    // after s: A .903010, B .030100, U .066890; P(k fails) = .90301·.9 + (.0301 + .06689)·.05 = .817559
    const w = whatIf(model, { observations: [{ symptomId: "s", present: true }], findings: [] }, "k", opts);
    const [a, b, u] = [0.27 / 0.299, 0.009 / 0.299, 0.02 / 0.299];
    expect(w.pFail).toBeCloseTo(a * 0.9 + (b + u) * 0.05, 12);
    expect(w.ifPass!.unlisted).toBeCloseTo((u * 0.95) / (a * 0.1 + (b + u) * 0.95), 12);
  });
});
