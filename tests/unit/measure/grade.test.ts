// Graded readings: the relative miss m = (distance past the limit) / scale, and its band —
// well within (m ≤ −0.25), near (≤ 0, passing), beyond (≤ 0.5), far beyond (> 0.5). Values hand
// computed; units converted by mathjs. The pad limits: 3 mm advisory (common practice) and the
// 1.5 mm defect line (DVSA MOT inspection manual §1.1.13, secondary, via SOURCES.md).
import { describe, expect, it } from "vitest";
import { evaluateRule, gradedFinding, gradeReading, MeasureError } from "~/measure";

describe("graded readings", () => {
  it("bands a pad reading against the 3 mm line", () => {
    // 0.8 mm: (3 − 0.8) / 3 = 0.7333 → far beyond; 2.4 mm: 0.6 / 3 = 0.2 → beyond
    expect(gradeReading("value >= 3 mm", "0.8 mm")).toMatchObject({
      result: "fail",
      band: "far_beyond",
      miss: expect.closeTo(2.2 / 3, 12),
    });
    expect(gradeReading("value >= 3 mm", "2.4 mm")).toMatchObject({
      result: "fail",
      band: "beyond",
      miss: expect.closeTo(0.2, 12),
    });
    // 3.5 mm: −0.5 / 3 = −0.1667 → near; 5 mm: −2 / 3 → well within
    expect(gradeReading("value >= 3 mm", "3.5 mm")).toMatchObject({ result: "pass", band: "near" });
    expect(gradeReading("value >= 3 mm", "5 mm")).toMatchObject({ result: "pass", band: "well_within" });
    // the far-beyond edge is half the advisory line: the 1.5 mm defect line (derived: 3 × (1 − 0.5))
    expect(gradeReading("value >= 3 mm", "1.5 mm").band).toBe("beyond");
    expect(gradeReading("value >= 3 mm", "1.49 mm").band).toBe("far_beyond");
  });

  it("converts units first: 0.0035 in of run-out is 0.0889 mm, (0.0889 − 0.05) / 0.05 = 0.778 → far beyond", () => {
    const g = gradeReading("value <= 0.05 mm", "0.0035 in");
    expect(g.miss).toBeCloseTo((0.0035 * 25.4 - 0.05) / 0.05, 9); // 1 in = 25.4 mm (NIST SP 811)
    expect(g.band).toBe("far_beyond");
  });

  it("uses half the window for a two-sided rule", () => {
    // charging 13.8–14.8 V, half-width 0.5 V: 12.3 V misses by 1.5 V → m = 3; 14.3 V is the middle → m = −1
    expect(gradeReading("value >= 13.8 V and value <= 14.8 V", "12.3 V")).toMatchObject({
      band: "far_beyond",
      miss: expect.closeTo(3, 12),
    });
    expect(gradeReading("value >= 13.8 V and value <= 14.8 V", "14.3 V")).toMatchObject({
      band: "well_within",
      miss: expect.closeTo(-1, 12),
    });
    // fuel trim ±10 %: 18 → 8 / 10 = 0.8 → far beyond; a chained rule reads the same
    expect(gradeReading("value >= -10 and value <= 10", "18").band).toBe("far_beyond");
    expect(gradeReading("0.03 mm <= value <= 0.13 mm", "0.2 mm").miss).toBeCloseTo(0.07 / 0.05, 12);
  });

  it("takes a stated scale where the limit is none, a temperature scale as a difference", () => {
    // disc thickness above its stamped minimum, limit 0 mm: no band without a scale
    expect(gradeReading("value >= 0 mm", "-0.4 mm").band).toBeNull();
    expect(gradeReading("value >= 0 mm", "-0.4 mm", "1 mm")).toMatchObject({
      band: "beyond",
      miss: expect.closeTo(0.4, 12),
    });
    // warm-up ≥ 80 °C, scale 20 °C: 150 °F = 65.556 °C → (80 − 65.556) / 20 = 0.7222
    expect(gradeReading("value >= 80 degC", "150 degF", "20 degC").miss).toBeCloseTo(
      (80 - ((150 - 32) * 5) / 9) / 20,
      9,
    );
    // a scale of 36 °F is the same difference as 20 °C (a difference converts by the factor 5/9 only)
    expect(gradeReading("value >= 80 degC", "62 degC", "36 degF").miss).toBeCloseTo(0.9, 9);
  });

  it("keeps pass and fail exactly as the rule says, and gives no band to an 'or' rule", () => {
    for (const [rule, reading] of [
      ["value >= 3 mm", "2.99 mm"],
      ["value <= 20 kPa", "2 psi"],
      ["value >= 1.6 mm", "0.16 cm"],
    ] as const) {
      expect(gradeReading(rule, reading).result).toBe(evaluateRule(rule, reading).result);
    }
    expect(gradeReading("value <= 1 mm or value >= 5 mm", "3 mm").band).toBeNull();
  });

  it("gives the reasoning engine a finding with its band", () => {
    expect(gradedFinding("pad_thickness", "value >= 3 mm", "0.8 mm")).toEqual({
      checkId: "pad_thickness",
      result: "fail",
      band: "far_beyond",
    });
    expect(() => gradeReading("value >= 3 mm", "1 mm", "0 mm")).toThrow(MeasureError);
  });
});
