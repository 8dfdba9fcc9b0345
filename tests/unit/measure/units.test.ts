// The unit definitions Ramplight relies on, checked in its own mathjs instance against their
// published definitions.
import * as globalMath from "mathjs";
import { describe, expect, it } from "vitest";
import { math } from "~/measure";

describe("unit definitions", () => {
  it("1 in = 25.4 mm exactly (international inch, NIST SP 811)", () => {
    expect(math.unit(1, "in").toNumber("mm")).toBeCloseTo(25.4, 12);
  });
  it("1 mile = 1.609344 km; 1 yard = 0.9144 m (NIST SP 811 §B.6)", () => {
    expect(math.unit(1, "mi").toNumber("km")).toBeCloseTo(1.609344, 12);
    expect(math.unit(1, "yd").toNumber("m")).toBeCloseTo(0.9144, 12);
  });
  it("US gallon = 231 in³ = 3.785411784 L (NIST Handbook 44 App. C)", () => {
    expect(math.unit(1, "gal").toNumber("L")).toBeCloseTo(3.785411784, 12);
    expect(math.unit(231, "in^3").toNumber("L")).toBeCloseTo(3.785411784, 12);
  });
  it("UK gallon = 4.54609 L exactly (Weights and Measures Act 1985, Schedule 1 — secondary)", () => {
    expect(math.unit(1, "ukgal").toNumber("L")).toBeCloseTo(4.54609, 12);
  });
  it("1 lbf·ft = 1.3558179483 N·m (mathjs definitions: lbf = 4.4482216152605 N, ft = 0.3048 m)", () => {
    expect(math.unit(1, "lbf ft").toNumber("N m")).toBeCloseTo(1.3558179483, 10);
    expect(math.unit(1, "lbf").toNumber("N") * 0.3048).toBeCloseTo(1.3558179483, 10);
  });
  it("the UK gallon is defined only in Ramplight's instance, not the global mathjs", () => {
    expect(math.Unit.isValuelessUnit("ukgal")).toBe(true);
    expect(globalMath.Unit.isValuelessUnit("ukgal")).toBe(false);
  });
});
