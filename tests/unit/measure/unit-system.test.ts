// The workshop's unit system in forms and on screens. Conversion factors: 1 mile = 1.609344 km and
// 1 in = 25.4 mm exactly (NIST SP 811 §B.6); 1 UK pint = 0.56826125 L (Weights and Measures Act
// 1985, Schedule 1, via the UK gallon of 4.54609 L); 1 psi = 6.894757 kPa (NIST SP 811 §B.8).
import { describe, expect, it } from "vitest";
import {
  describeRule,
  evaluateRule,
  formatMileage,
  MeasureError,
  parseDecimal,
  parseMileage,
  readReading,
} from "~/measure";

const message = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    if (e instanceof MeasureError) return e.message;
    throw e;
  }
  return "no error";
};

describe("mileage in the workshop's units", () => {
  it("reads thousands separators and the system's own unit", () => {
    expect(parseMileage("84,000", "imperial")).toEqual({ ok: true, value: Math.round(84_000 * 1.609344) }); // 135,185 km
    expect(parseMileage("84 000", "metric")).toEqual({ ok: true, value: 84_000 });
    expect(parseMileage("84000 miles", "metric")).toEqual({ ok: true, value: 135_185 });
    expect(parseMileage("135,185 km", "imperial")).toEqual({ ok: true, value: 135_185 });
    expect(parseMileage("68940", "metric")).toEqual({ ok: true, value: 68_940 });
  });

  it("refuses what is not a whole mileage, saying how to write one", () => {
    for (const bad of ["84,00", "8.4", "lots", "-5", "84,000 furlongs", ""]) {
      const r = parseMileage(bad, "imperial");
      expect(r.ok, bad).toBe(false);
      if (!r.ok) expect(r.message, bad).toMatch(/whole number of miles/);
    }
  });

  it("shows a stored km figure in miles for an imperial workshop, and round-trips what was typed", () => {
    expect(formatMileage(68_940, "metric")).toBe("68,940 km");
    expect(formatMileage(68_940, "imperial")).toBe("42,837 miles"); // 68,940 / 1.609344 = 42,837.3
    const typed = parseMileage("84,000", "imperial");
    expect(typed.ok && formatMileage(typed.value, "imperial")).toBe("84,000 miles");
  });

  it("reads decimals with thousands separators in money fields", () => {
    expect(parseDecimal("1,250.50")).toBe(1250.5);
    expect(parseDecimal("84")).toBe(84);
    expect(parseDecimal("1,25")).toBeNull();
    expect(parseDecimal("12a")).toBeNull();
  });
});

describe("readings as technicians write them", () => {
  it("takes a percentage for a ratio check (plain-number rule), written with % or in words", () => {
    for (const r of ["65 %", "65%", "65 percent", "65 per cent"])
      expect(evaluateRule("value >= 70", r).result, r).toBe("fail");
    expect(evaluateRule("value >= 70", "72 %").result).toBe("pass");
    expect(readReading("65 %").percent).toBe(true);
  });

  it("refuses a percentage where a length is needed, saying what is needed", () => {
    expect(message(() => evaluateRule("value >= 1.6 mm", "65 %"))).toBe(
      "That reading is a percentage; this check needs a length, such as 1.6 mm.",
    );
  });

  it("reads fractions of an inch as tread gauges show them: 2/32 in = 1.5875 mm, below 1.6 mm", () => {
    // Road Vehicles (Construction and Use) Regulations 1986 reg. 27: 1.6 mm minimum (secondary source).
    expect(evaluateRule("value >= 1.6 mm", "2/32 in")).toMatchObject({
      result: "fail",
      reading: "1.5875 mm",
    });
    expect(evaluateRule("value >= 1.6 mm", '3/32"')).toMatchObject({ result: "pass", reading: "2.38125 mm" });
    expect(evaluateRule("value >= 1.6 mm", "1 1/2 in").result).toBe("pass");
    expect(message(() => evaluateRule("value >= 1.6 mm", "2/0 in"))).toMatch(/divides by zero/);
  });
});

describe("limits in words, in the workshop's units", () => {
  it("metric shows the rule's own figure", () => {
    expect(describeRule("value <= 0.05 mm", "metric")).toBe("at most 0.05 mm");
    expect(describeRule("1.6 mm <= value", "metric")).toBe("at least 1.6 mm");
    expect(describeRule("value >= 200 kPa and value <= 260 kPa", "metric")).toBe(
      "at least 200 kPa and at most 260 kPa",
    );
    expect(describeRule("value <= 10", "metric")).toBe("at most 10");
  });

  it("imperial shows inches, psi and pints with the stored figure beside them", () => {
    expect(describeRule("value <= 0.05 mm", "imperial")).toBe("at most 0.00197 in (0.05 mm)"); // 0.05 / 25.4
    expect(describeRule("value >= 1.6 mm", "imperial")).toBe("at least 0.063 in (1.6 mm)");
    expect(describeRule("value >= 200 kPa", "imperial")).toBe("at least 29 psi (200 kPa)"); // 200 / 6.894757 = 29.0
    expect(describeRule("value <= 1 L", "imperial")).toBe("at most 1.76 pt (1 L)"); // 1 / 0.56826125 = 1.7598
    // Temperatures stay in °C for a UK workshop; volts have no imperial form.
    expect(describeRule("value <= 105 degC", "imperial")).toBe("at most 105 degC");
    expect(describeRule("12.4 V <= value", "imperial")).toBe("at least 12.4 V");
  });
});
