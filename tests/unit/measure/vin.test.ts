// VIN (ISO 3779; 49 CFR Part 565): 17 characters, no I, O, Q; check digit at position 9 from
// the transliteration table and weights 8 7 6 5 4 3 2 10 0 9 8 7 6 5 4 3 2, sum mod 11, 10 → X
// (table and weights recalled from memory of 49 CFR 565.15).
import { describe, expect, it } from "vitest";
import { validateVin, vinCheckDigit } from "~/measure";

describe("VIN", () => {
  it("1M8GDM9AXKP042788 is valid — the example usually quoted from 49 CFR 565 (from memory)", () => {
    // values 1 M4 8 G7 D4 M4 9 A1 X(·0) K2 P7 0 4 2 7 8 8
    // × weights: 8 28 48 35 16 12 18 10 0 18 56 0 24 10 28 24 16 → sum 351; 351 mod 11 = 10 → X
    expect(vinCheckDigit("1M8GDM9AXKP042788")).toBe("X");
    expect(validateVin("1M8GDM9AXKP042788", { requireCheckDigit: true })).toMatchObject({
      valid: true,
      wmi: "1M8",
      vds: "GDM9AX",
      vis: "KP042788",
      checkDigit: "X",
      checkDigitMatches: true,
    });
  });

  it("seventeen 1s is valid: the weights sum to 89 and 89 mod 11 = 1", () => {
    // 8+7+6+5+4+3+2+10+0+9+8+7+6+5+4+3+2 = 89 = 8 × 11 + 1
    expect(vinCheckDigit("11111111111111111")).toBe("1");
    expect(validateVin("11111111111111111", { requireCheckDigit: true }).valid).toBe(true);
  });

  it("a VIN built by computing its check digit", () => {
    // WVWZZZ1J?XW000001 (European style, where the check digit is not used):
    //   W6×8 = 48, V5×7 = 35, W6×6 = 36, Z9×5 = 45, Z9×4 = 36, Z9×3 = 27, 1×2 = 2, J1×10 = 10,
    //   ?×0 = 0, X7×9 = 63, W6×8 = 48, 0 0 0 0 0, 1×2 = 2 → sum 352 = 32 × 11 + 0 → "0"
    expect(vinCheckDigit("WVWZZZ1JZXW000001")).toBe("0");
    expect(validateVin("WVWZZZ1J0XW000001", { requireCheckDigit: true }).valid).toBe(true);
    // without the option the check digit is reported but not required (mandatory in North America only)
    expect(validateVin("WVWZZZ1JZXW000001")).toMatchObject({ valid: true, checkDigitMatches: false });
    expect(validateVin("WVWZZZ1JZXW000001", { requireCheckDigit: true })).toMatchObject({
      valid: false,
      code: "VIN_CHECK_DIGIT",
    });
  });

  it("one mistyped character is caught by the check digit when required", () => {
    const r = validateVin("1M8GDM9AXKP042789", { requireCheckDigit: true });
    expect(r).toMatchObject({ valid: false, code: "VIN_CHECK_DIGIT" });
  });

  it("normalises case, spaces and dashes", () => {
    expect(validateVin(" 1m8gdm9axkp042788 ")).toMatchObject({ valid: true, vin: "1M8GDM9AXKP042788" });
    expect(validateVin("1M8-GDM9AX-KP042788")).toMatchObject({ valid: true });
  });

  it("refuses wrong length and letters a VIN never uses", () => {
    expect(validateVin("1M8GDM9AXKP04278")).toMatchObject({ valid: false, code: "VIN_LENGTH" });
    expect(validateVin("1M8GDM9AXKP04278O")).toMatchObject({
      valid: false,
      code: "VIN_CHARACTER",
      message: expect.stringMatching(/probably 0/),
    });
    expect(validateVin("IM8GDM9AXKP042788")).toMatchObject({
      valid: false,
      code: "VIN_CHARACTER",
      message: expect.stringMatching(/probably 1/),
    });
    expect(validateVin("1M8GDM9AXKP04278Q")).toMatchObject({ valid: false, code: "VIN_CHARACTER" });
    expect(validateVin("1M8GDM9AXKP04278*")).toMatchObject({ valid: false, code: "VIN_CHARACTER" });
  });
});
