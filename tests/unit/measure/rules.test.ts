// Measurement rules: a mathjs comparison over `value`, true when the reading PASSES.
import { describe, expect, it } from "vitest";
import { compileRule, evaluateRule, findingFromReading, MeasureError, parseReading } from "~/measure";

const codeOf = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    if (e instanceof MeasureError) return e.code;
    throw e;
  }
  return "no error";
};

describe("unit-aware rules", () => {
  it("disc run-out limit 0.05 mm (a generic value; real limits are per vehicle)", () => {
    expect(evaluateRule("value <= 0.05 mm", "0.09 mm")).toEqual({
      pass: false,
      result: "fail",
      reading: "0.09 mm",
    });
    expect(evaluateRule("value <= 0.05 mm", "0.03 mm").pass).toBe(true);
  });

  it("0.0035 in against value <= 0.05 mm fails: 0.0035 × 25.4 = 0.0889 mm > 0.05 mm", () => {
    const r = evaluateRule("value <= 0.05 mm", "0.0035 in");
    expect(r.pass).toBe(false);
    expect(r.reading).toBe("0.0889 mm");
  });

  it("0.0019 in passes: 0.0019 × 25.4 = 0.04826 mm ≤ 0.05 mm", () => {
    expect(evaluateRule("value <= 0.05 mm", "0.0019 in")).toMatchObject({
      pass: true,
      reading: "0.04826 mm",
    });
  });

  it("tyre tread ≥ 1.6 mm (Road Vehicles (Construction and Use) Regulations 1986 reg. 27 — secondary)", () => {
    const tread = "value >= 1.6 mm";
    expect(evaluateRule(tread, "1.5 mm").result).toBe("fail");
    expect(evaluateRule(tread, "3 mm").result).toBe("pass");
    // exactly at the limit, written in cm: 0.16 cm = 1.6 mm passes (mathjs relative tolerance)
    expect(evaluateRule(tread, "0.16 cm").result).toBe("pass");
    expect(evaluateRule(tread, "1.6 mm").result).toBe("pass");
    // 2/32 in = 1.5875 mm, below 1.6 mm; 0.0625 in written as a decimal
    expect(evaluateRule(tread, "0.0625 in").result).toBe("fail");
  });

  it("ranges, chained comparisons, and/or/not", () => {
    expect(evaluateRule("0.03 mm <= value <= 0.13 mm", "0.1 mm").pass).toBe(true);
    expect(evaluateRule("0.03 mm <= value <= 0.13 mm", "0.2 mm").pass).toBe(false);
    expect(evaluateRule("value >= 0.03 mm and value <= 0.13 mm", "0.01 mm").pass).toBe(false);
    expect(evaluateRule("value < 1 mm or value > 5 mm", "6 mm").pass).toBe(true);
    expect(evaluateRule("not (value > 5 mm)", "2 mm").pass).toBe(true);
  });

  it("torque in lbf·ft against N·m: 40 lbf·ft = 40 × 1.3558179483 = 54.233 N·m", () => {
    expect(evaluateRule("value <= 40 lbf ft", "54 N m").pass).toBe(true);
    expect(evaluateRule("value <= 40 lbf ft", "55 N m").pass).toBe(false);
    expect(evaluateRule("value >= 110 N m", "81 lbf ft").pass).toBe(false); // 81 × 1.3558 = 109.82
    expect(evaluateRule("value >= 110 N m", "81.2 lbf ft").pass).toBe(true); // 110.09
  });

  it("pressures: 32 psi = 32 × 6.894757 = 220.63 kPa", () => {
    expect(evaluateRule("value >= 220 kPa", "32 psi")).toMatchObject({ pass: true, reading: "220.632 kPa" });
    expect(evaluateRule("value >= 2.2 bar", "32 psi").pass).toBe(true);
  });

  it("temperatures convert with their offsets: 194 °F = (194 − 32) × 5/9 = 90 °C", () => {
    expect(evaluateRule("value >= 90 degC", "194 degF").pass).toBe(true);
    expect(evaluateRule("value >= 91 degC", "194 degF").pass).toBe(false);
  });

  it("plain-number rules", () => {
    expect(evaluateRule("value < 3", "2").pass).toBe(true);
    expect(evaluateRule("value < 3", 4).pass).toBe(false);
  });

  it("readings as { value, unit } and findings for the reasoning engine", () => {
    expect(evaluateRule("value <= 0.05 mm", { value: 0.0035, unit: "in" }).pass).toBe(false);
    expect(findingFromReading("runout", "value <= 0.05 mm", "0.09 mm")).toEqual({
      checkId: "runout",
      result: "fail",
    });
  });
});

describe("clear errors, never a silent pass", () => {
  it("unit of the wrong kind", () => {
    expect(() => evaluateRule("value <= 0.05 mm", "30 kPa")).toThrow(
      "That reading is in kPa; this check needs a length, such as 0.05 mm.",
    );
    expect(() => evaluateRule("value >= 220 kPa", "2 mm")).toThrow(
      "That reading is in mm; this check needs a pressure, such as 220 kPa.",
    );
    expect(() => evaluateRule("value <= 40 N m", "40 kg")).toThrow(/needs a torque/);
    expect(codeOf(() => evaluateRule("value <= 0.05 mm", "30 kPa"))).toBe("UNIT_MISMATCH");
    expect(codeOf(() => evaluateRule("value * 2 <= 5 mm", "2 kPa"))).toBe("UNIT_MISMATCH");
  });

  it("missing or unexpected unit", () => {
    expect(() => evaluateRule("value <= 0.05 mm", "0.05")).toThrow(
      "That reading has no unit; this check needs a length, such as 0.05 mm.",
    );
    expect(codeOf(() => evaluateRule("value <= 0.05 mm", "0.05"))).toBe("MISSING_UNIT");
    expect(codeOf(() => evaluateRule("value < 3", "2 mm"))).toBe("UNEXPECTED_UNIT");
  });

  it("readings that do not parse", () => {
    expect(codeOf(() => parseReading(""))).toBe("EMPTY_READING");
    expect(codeOf(() => parseReading("0,09 mm"))).toBe("DECIMAL_COMMA");
    expect(codeOf(() => parseReading("0.09 mmm"))).toBe("UNKNOWN_UNIT");
    expect(codeOf(() => parseReading("about 3 mm"))).toBe("UNKNOWN_UNIT");
    expect(codeOf(() => parseReading("3 mm 4"))).toBe("BAD_READING");
    expect(codeOf(() => parseReading("mm"))).toBe("BAD_READING");
    expect(codeOf(() => parseReading({ value: Number.NaN, unit: "mm" }))).toBe("BAD_READING");
    expect(codeOf(() => parseReading({ value: 3, unit: "furlongs" }))).toBe("UNKNOWN_UNIT");
  });

  it("rules outside the whitelist are refused before anything runs", () => {
    expect(codeOf(() => compileRule("sqrt(value) < 2"))).toBe("UNSUPPORTED_RULE"); // function call
    expect(codeOf(() => compileRule("value = 3"))).toBe("UNSUPPORTED_RULE"); // assignment
    expect(codeOf(() => compileRule("f(x) = x; f(value) < 2"))).toBe("UNSUPPORTED_RULE"); // function definition, block
    expect(codeOf(() => compileRule('value == "x"'))).toBe("UNSUPPORTED_RULE"); // string
    expect(codeOf(() => compileRule("value < pi"))).toBe("UNSUPPORTED_RULE"); // a symbol that is not a unit
    expect(codeOf(() => compileRule("value <= 2.5 mm to in"))).toBe("UNSUPPORTED_RULE"); // conversion operator
    expect(codeOf(() => compileRule("[1, 2][1] < value"))).toBe("UNSUPPORTED_RULE"); // matrix / index
    expect(codeOf(() => compileRule("value < 3 ? 1 : 0"))).toBe("UNSUPPORTED_RULE"); // conditional
    expect(codeOf(() => compileRule("value < 5 mm xor value > 1 mm"))).toBe("UNSUPPORTED_RULE");
  });

  it("rules that are not tests, do not parse, or mix kinds of unit", () => {
    expect(codeOf(() => compileRule("value"))).toBe("RULE_NOT_A_TEST");
    expect(codeOf(() => compileRule("value + 2 mm"))).toBe("RULE_NOT_A_TEST");
    expect(codeOf(() => compileRule("value <= "))).toBe("BAD_RULE");
    expect(codeOf(() => compileRule(""))).toBe("BAD_RULE");
    expect(codeOf(() => compileRule("value <= 5 mm and value > 1 kPa"))).toBe("RULE_UNIT_MISMATCH");
    expect(codeOf(() => evaluateRule("value <= mm", "2 mm"))).toBe("BAD_RULE");
  });
});
