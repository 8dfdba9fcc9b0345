// Fuel consumption (NIST SP 811 §B.5: L/100 km = 235.215 / mpg(US); UK from the two gallon
// definitions: 100 × 4.54609 / 1.609344 = 282.481) and the metric/imperial formatter.
import { describe, expect, it } from "vitest";
import {
  convertFuelConsumption,
  formatQuantity,
  L100KM_TIMES_MPG_UK,
  L100KM_TIMES_MPG_US,
  MeasureError,
} from "~/measure";

describe("fuel consumption", () => {
  it("constants from the unit definitions", () => {
    // 100 × 3.785411784 / 1.609344 = 235.2145833…; 100 × 4.54609 / 1.609344 = 282.4809363…
    expect(L100KM_TIMES_MPG_US).toBeCloseTo(235.215, 3);
    expect(L100KM_TIMES_MPG_UK).toBeCloseTo(282.48093633, 8);
  });

  it("24 mpg (US) → 9.8 L/100 km (NIST SP 811 example)", () => {
    expect(convertFuelConsumption(24, "mpg_us", "L/100km")).toBeCloseTo(9.8, 2);
  });

  it("UK mpg, both directions and between gallons", () => {
    // 40 mpg (UK) → 282.481 / 40 = 7.062 L/100 km; 7.062 → 40 back
    expect(convertFuelConsumption(40, "mpg_uk", "L/100km")).toBeCloseTo(282.4809363 / 40, 6);
    expect(convertFuelConsumption(282.4809363 / 40, "L/100km", "mpg_uk")).toBeCloseTo(40, 6);
    // mpg(UK) = mpg(US) × 4.54609 / 3.785411784 = × 1.200950: 24 mpg US = 28.8228 mpg UK
    expect(convertFuelConsumption(24, "mpg_us", "mpg_uk")).toBeCloseTo(24 * (4.54609 / 3.785411784), 9);
    expect(convertFuelConsumption(6.5, "L/100km", "L/100km")).toBe(6.5);
  });

  it("refuses zero, negative and unknown units", () => {
    expect(() => convertFuelConsumption(0, "mpg_us", "L/100km")).toThrow(MeasureError);
    expect(() => convertFuelConsumption(-3, "L/100km", "mpg_uk")).toThrow(/above 0/);
    expect(() => convertFuelConsumption(5, "km/L" as "mpg_us", "L/100km")).toThrow(/not L\/100km/);
  });
});

describe("unit-system formatting", () => {
  it("lengths: 0.0035 in = 0.0889 mm; 1.6 mm = 0.063 in", () => {
    expect(formatQuantity("0.0035 in", "length", "metric").text).toBe("0.0889 mm");
    expect(formatQuantity("1.6 mm", "length", "imperial").text).toBe("0.063 in"); // 1.6 / 25.4 = 0.06299
  });

  it("pressures: 32 psi = 220.6 kPa (3 significant figures → 221)", () => {
    expect(formatQuantity("32 psi", "pressure", "metric").text).toBe("221 kPa");
    expect(formatQuantity("32 psi", "pressure", "metric", 4).text).toBe("220.6 kPa");
    expect(formatQuantity("2.2 bar", "pressure", "imperial").text).toBe("31.9 psi"); // 220 / 6.894757 = 31.91
  });

  it("torque: 110 N·m = 110 / 1.3558179483 = 81.13 lbf·ft", () => {
    expect(formatQuantity("110 N m", "torque", "imperial")).toMatchObject({
      text: "81.1 lbf·ft",
      unit: "lbf·ft",
    });
    expect(formatQuantity("81.13 lbf ft", "torque", "metric").text).toBe("110 N·m");
  });

  it("volumes: 4.5 L = 0.990 UK gal (÷ 4.54609) = 1.19 US gal (÷ 3.785411784)", () => {
    expect(formatQuantity("4.5 L", "volume", "imperial").text).toBe("0.99 gal (UK)");
    expect(formatQuantity("4.5 L", "volume", "us").text).toBe("1.19 gal (US)");
    expect(formatQuantity("1 ukgal", "volume", "metric", 6).text).toBe("4.54609 L");
  });

  it("distances keep whole units: 123456 km = 76712 mi (÷ 1.609344)", () => {
    expect(formatQuantity("123456 km", "distance", "imperial").text).toBe("76712 mi");
    expect(formatQuantity("100 mi", "distance", "metric").text).toBe("161 km");
  });

  it("wrong kind of quantity is an error", () => {
    expect(() => formatQuantity("3 kPa", "length", "metric")).toThrow(
      "That value is in kPa; it should be a length, such as 1 mm.",
    );
    expect(() => formatQuantity("3", "torque", "metric")).toThrow(/has no unit/);
  });
});
