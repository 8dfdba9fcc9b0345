// A measured finding counts by how far it misses: P(band | cause) from a link's graded figures,
// else its P(fail) split by the default shares (fault: beyond .5, far .5, near .6, well .4; sound
// part: beyond .8, far .2, near .3, well .7). Posteriors hand-computed by Bayes' rule (Russell &
// Norvig, AIMA ch. 13).
import { describe, expect, it } from "vitest";
import { rankCauses, ReasoningError, type Model } from "~/reasoning";
import { buildModel } from "~/kb/model";
import { knowledgeFromSeed } from "../../bench/diagnosis/model";
import { starterKnowledgeBase as kb } from "../../../seeds/kb";

const prob = (r: ReturnType<typeof rankCauses>, id: string) => r.causes.find((c) => c.id === id)!.probability;

describe("graded figures on a link", () => {
  // W "pads worn near the limit" (base 10) and M "worn to the backing plate" (base 2.5):
  // P(W) = .8, P(M) = .2; the pad check, false alarm .03, bears on both with graded figures.
  const pads: Model = {
    causes: [
      { id: "W", prior: 10 },
      { id: "M", prior: 2.5 },
    ],
    symptoms: [],
    links: [],
    checks: [
      {
        id: "pad",
        cost: 15,
        falseAlarm: 0.03,
        bears: [
          {
            causeId: "W",
            pFail: 0.9,
            graded: { well_within: 0.02, near: 0.08, beyond: 0.75, far_beyond: 0.15 },
          },
          {
            causeId: "M",
            pFail: 0.98,
            graded: { well_within: 0.005, near: 0.015, beyond: 0.08, far_beyond: 0.9 },
          },
        ],
      },
    ],
  };
  const u = { unlistedPrior: 0 };

  it("ranks the backing plate first for a reading far beyond the limit (0.8 mm)", () => {
    // W .8 × .15 = .12, M .2 × .9 = .18 → P(M) = .18 / .30 = .6
    const r = rankCauses(
      pads,
      { observations: [], findings: [{ checkId: "pad", result: "fail", band: "far_beyond" }] },
      u,
    );
    expect(r.causes[0].id).toBe("M");
    expect(prob(r, "M")).toBeCloseTo(0.6, 12);
  });

  it("ranks worn-near-the-limit first for a reading just beyond (2.4 mm), as pass/fail alone does", () => {
    // beyond: W .8 × .75 = .6, M .2 × .08 = .016 → P(W) = .6 / .616 = .974026
    const r = rankCauses(
      pads,
      { observations: [], findings: [{ checkId: "pad", result: "fail", band: "beyond" }] },
      u,
    );
    expect(prob(r, "W")).toBeCloseTo(0.6 / 0.616, 12);
    // plain fail: W .8 × .9 = .72, M .2 × .98 = .196 → P(W) = .72 / .916 = .786026
    const plain = rankCauses(pads, { observations: [], findings: [{ checkId: "pad", result: "fail" }] }, u);
    expect(prob(plain, "W")).toBeCloseTo(0.72 / 0.916, 12);
  });
});

describe("default shares where a link has no graded figures", () => {
  // A, B equal, unlisted .2: priors .4, .4, .2; k (false alarm .1) bears on A with P(fail) .8.
  const m: Model = {
    causes: [
      { id: "A", prior: 1 },
      { id: "B", prior: 1 },
    ],
    symptoms: [],
    links: [],
    checks: [{ id: "k", cost: 10, falseAlarm: 0.1, bears: [{ causeId: "A", pFail: 0.8 }] }],
  };
  const rank = (result: "pass" | "fail", band?: "well_within" | "near" | "beyond" | "far_beyond") =>
    rankCauses(
      m,
      { observations: [], findings: [band ? { checkId: "k", result, band } : { checkId: "k", result }] },
      { unlistedPrior: 0.2 },
    );

  it.each([
    // far: A .8·.5 = .4, B and U .1·.2 = .02 → .16, .008, .004 → .16 / .172
    ["fail", "far_beyond", 0.16 / 0.172],
    // beyond: A .8·.5 = .4, B and U .1·.8 = .08 → .16, .032, .016 → .16 / .208
    ["fail", "beyond", 0.16 / 0.208],
    // near: A .2·.6 = .12, B and U .9·.3 = .27 → .048, .108, .054 → .048 / .21
    ["pass", "near", 0.048 / 0.21],
    // well within: A .2·.4 = .08, B and U .9·.7 = .63 → .032, .252, .126 → .032 / .41
    ["pass", "well_within", 0.032 / 0.41],
  ] as const)("%s %s gives P(A) by hand", (result, band, expected) => {
    expect(prob(rank(result, band), "A")).toBeCloseTo(expected, 12);
  });

  it("pass or fail without a band is unchanged", () => {
    // fail: .32, .04, .02 → .32 / .38; pass: .08, .36, .18 → .08 / .62
    expect(prob(rank("fail"), "A")).toBeCloseTo(0.32 / 0.38, 12);
    expect(prob(rank("pass"), "A")).toBeCloseTo(0.08 / 0.62, 12);
    // a reading far beyond counts more than a bare fail, one well within clears more than a bare pass
    expect(prob(rank("fail", "far_beyond"), "A")).toBeGreaterThan(prob(rank("fail"), "A"));
    expect(prob(rank("pass", "well_within"), "A")).toBeLessThan(prob(rank("pass"), "A"));
  });

  it("refuses a band that contradicts the result, and graded figures that do not add up to 1", () => {
    const bad = () =>
      rankCauses(m, { observations: [], findings: [{ checkId: "k", result: "pass", band: "far_beyond" }] });
    expect(bad).toThrow(ReasoningError);
    const sums: Model = {
      ...m,
      checks: [
        {
          ...m.checks[0],
          bears: [
            {
              causeId: "A",
              pFail: 0.8,
              graded: { well_within: 0.1, near: 0.1, beyond: 0.4, far_beyond: 0.5 },
            },
          ],
        },
      ],
    };
    try {
      rankCauses(sums, { observations: [], findings: [] });
      expect.unreachable();
    } catch (e) {
      expect((e as ReasoningError).code).toBe("INVALID_PROBABILITY");
    }
  });
});

describe("on the starter knowledge base", () => {
  it("a 0.8 mm pad reading ranks 'worn to the backing plate' above 'worn near the limit'", () => {
    // a well-used car (9 years, 161,000 km) with grinding from the front and the pads measured at 0.8 mm
    const model = buildModel(
      knowledgeFromSeed(),
      { fuel: "diesel", drivetrain: "fwd", ageYears: 9, km: 161_000 },
      60,
    );
    const graded = new Map(
      kb.checkLinks.filter((l) => l.graded).map((l) => [`${l.check}|${l.cause}`, l.graded]),
    );
    model.checks = model.checks.map((k) => ({
      ...k,
      bears: k.bears.map((b) => ({ ...b, graded: graded.get(`${k.id}|${b.causeId}`) })),
    }));
    const findings = (band?: "far_beyond") => [
      { checkId: "pad_thickness", result: "fail" as const, ...(band ? { band } : {}) },
    ];
    const before = rankCauses(model, { observations: [], findings: findings() });
    const after = rankCauses(model, { observations: [], findings: findings("far_beyond") });
    const at = (r: ReturnType<typeof rankCauses>, id: string) => r.causes.findIndex((c) => c.id === id);
    expect(at(before, "brake_pads_worn")).toBeLessThan(at(before, "brake_pads_metal")); // pass/fail alone: the complaint
    expect(at(after, "brake_pads_metal")).toBeLessThan(at(after, "brake_pads_worn"));
    expect(after.causes[0].id).toBe("brake_pads_metal");
  });
});
