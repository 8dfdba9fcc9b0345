// resolvePriors: base rate × applicability, normalised, blended with outcome counts by additive
// (Dirichlet) smoothing p̂ = (count + α·p₀) / (n + α) (Manning, Raghavan & Schütze, Introduction
// to Information Retrieval, ch. 13 — recalled from memory). Arithmetic by hand in each case.
import { describe, expect, it } from "vitest";
import {
  checkCost,
  DEFAULT_PSEUDO_COUNT,
  DEFAULT_YOUNG_FACTOR,
  ReasoningError,
  resolvePriors,
  type PriorInput,
} from "~/reasoning";

const causes: PriorInput[] = [
  { id: "glow-plug", baseRate: 2, applicability: { fuel: ["diesel"] } },
  { id: "coil-pack", baseRate: 2, applicability: { fuel: ["petrol", "lpg"] } },
  { id: "cv-joint", baseRate: 1, applicability: { drivetrain: ["fwd", "awd"], minKm: 80_000 } },
  { id: "battery", baseRate: 1, applicability: { minAgeYears: 4, minKm: 60_000, youngFactor: 0.5 } },
];
const byId = (rs: ReturnType<typeof resolvePriors>) => Object.fromEntries(rs.map((r) => [r.id, r]));

describe("resolvePriors", () => {
  it("stated defaults", () => {
    expect(DEFAULT_PSEUDO_COUNT).toBe(20);
    expect(DEFAULT_YOUNG_FACTOR).toBe(0.3);
  });

  it("applicability: other fuels and drivetrains get 0; young vehicles are scaled per threshold", () => {
    // petrol rwd, 3 years, 50 000 km:
    //   glow-plug 0 (diesel only); coil-pack 2; cv-joint 0 (not rwd); battery 1 × .5 (age) × .5 (km) = .25
    //   p₀: coil-pack 2 / 2.25 = 8/9, battery .25 / 2.25 = 1/9
    const r = byId(resolvePriors(causes, { fuel: "petrol", drivetrain: "rwd", ageYears: 3, km: 50_000 }));
    expect(r["glow-plug"]).toMatchObject({ factor: 0, prior: 0 });
    expect(r["cv-joint"].factor).toBe(0);
    expect(r["battery"].factor).toBeCloseTo(0.25, 14);
    expect(r["coil-pack"].prior).toBeCloseTo(8 / 9, 14);
    expect(r["battery"].prior).toBeCloseTo(1 / 9, 14);
  });

  it("default young factor 0.3 and unknown facts leave the rate alone", () => {
    // diesel fwd, km 40 000, age unknown: glow-plug 2, coil 0, cv-joint 1 × .3 = .3, battery 1 × .5 (km only) = .5
    // p₀ = 2/2.8, .3/2.8, .5/2.8
    const r = byId(resolvePriors(causes, { fuel: "diesel", drivetrain: "fwd", km: 40_000 }));
    expect(r["glow-plug"].prior).toBeCloseTo(2 / 2.8, 14);
    expect(r["cv-joint"].prior).toBeCloseTo(0.3 / 2.8, 14);
    expect(r["battery"].prior).toBeCloseTo(0.5 / 2.8, 14);
    // nothing known about the vehicle: every factor 1, p₀ = 2/6, 2/6, 1/6, 1/6
    const any = byId(resolvePriors(causes, {}));
    expect(any["coil-pack"].prior).toBeCloseTo(1 / 3, 14);
  });

  it("smoothing with outcome counts, α = 20", () => {
    // nothing known: p₀ = 1/3, 1/3, 1/6, 1/6; counts glow-plug 6, battery 4 → n = 10
    //   glow-plug (6 + 20/3) / 30 = 19/45;  coil-pack (0 + 20/3) / 30 = 2/9
    //   cv-joint (0 + 20/6) / 30 = 1/9;     battery (4 + 20/6) / 30 = 11/45   (sum = 1)
    const r = byId(resolvePriors(causes, {}, { outcomes: { "glow-plug": 6, battery: 4 } }));
    expect(r["glow-plug"].prior).toBeCloseTo(19 / 45, 14);
    expect(r["coil-pack"].prior).toBeCloseTo(2 / 9, 14);
    expect(r["cv-joint"].prior).toBeCloseTo(1 / 9, 14);
    expect(r["battery"].prior).toBeCloseTo(11 / 45, 14);
    expect(r["battery"].count).toBe(4);
  });

  it("α = 0 is pure frequencies; no counts is the base rates", () => {
    const freq = byId(
      resolvePriors(causes, {}, { outcomes: { "glow-plug": 3, battery: 1 }, pseudoCount: 0 }),
    );
    expect(freq["glow-plug"].prior).toBeCloseTo(0.75, 14);
    expect(freq["coil-pack"].prior).toBe(0);
    const base = byId(resolvePriors(causes, {}, { pseudoCount: 0 }));
    expect(base["coil-pack"].prior).toBeCloseTo(1 / 3, 14);
  });

  it("a confirmed outcome outweighs an applicability rule that said 0", () => {
    // petrol car, but a closed case confirmed a glow plug (the rule or the record is wrong: the
    // count still counts). p₀(glow-plug) = 0 → (1 + 0) / (1 + 20) = 1/21
    const r = byId(resolvePriors(causes, { fuel: "petrol" }, { outcomes: { "glow-plug": 1 } }));
    expect(r["glow-plug"].prior).toBeCloseTo(1 / 21, 14);
  });

  it("typed errors", () => {
    const code = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return e instanceof ReasoningError ? e.code : "other";
      }
      return "none";
    };
    expect(code(() => resolvePriors([], {}))).toBe("EMPTY_MODEL");
    expect(code(() => resolvePriors([{ id: "a", baseRate: -1 }], {}))).toBe("INVALID_PRIOR");
    expect(code(() => resolvePriors([{ id: "a", baseRate: Number.NaN }], {}))).toBe("INVALID_PRIOR");
    expect(
      code(() =>
        resolvePriors(
          [
            { id: "a", baseRate: 1 },
            { id: "a", baseRate: 1 },
          ],
          {},
        ),
      ),
    ).toBe("DUPLICATE_ID");
    expect(code(() => resolvePriors(causes, {}, { outcomes: { nope: 1 } }))).toBe("UNKNOWN_ID");
    expect(code(() => resolvePriors(causes, {}, { outcomes: { battery: -2 } }))).toBe("INVALID_PRIOR");
    expect(code(() => resolvePriors(causes, {}, { pseudoCount: -1 }))).toBe("INVALID_OPTION");
    expect(
      code(() =>
        resolvePriors([{ id: "a", baseRate: 1, applicability: { fuel: ["diesel"] } }], { fuel: "petrol" }),
      ),
    ).toBe("ZERO_PRIOR");
  });
});

describe("checkCost", () => {
  it("(minutes + access minutes) × rate / 60 + consumables", () => {
    // 12 min + ramp 5 + wheels off 10 = 27 min at 80/h = 36; + 4.5 consumables = 40.5
    expect(
      checkCost({
        minutes: 12,
        labourRatePerHour: 80,
        consumables: 4.5,
        access: { ramp: 5, wheels_off: 10 },
      }),
    ).toBeCloseTo(40.5, 12);
    expect(checkCost({ minutes: 30, labourRatePerHour: 60 })).toBe(30);
  });

  it("refuses negative or non-numeric parts", () => {
    expect(() => checkCost({ minutes: -1, labourRatePerHour: 60 })).toThrow(ReasoningError);
    expect(() => checkCost({ minutes: 5, labourRatePerHour: 60, access: { ramp: -5 } })).toThrow(/ramp/);
    expect(() => checkCost({ minutes: 5, labourRatePerHour: Number.NaN })).toThrow(/labour rate/);
    expect(() => checkCost({ minutes: 5, labourRatePerHour: 60, consumables: -1 })).toThrow(/Consumables/);
  });
});
