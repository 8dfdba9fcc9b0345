// Vehicle identification number (ISO 3779; US 49 CFR Part 565). 17 characters, digits and capital
// letters except I, O and Q (too easily read as 1 and 0). Position 9 is a check digit: each
// character is transliterated to a number, weighted, summed, taken mod 11, with 10 written X.
// The check digit is mandatory in North America only, so it is verified only when asked.
// Table and weights as in 49 CFR 565.15 (recalled from memory, not re-read for this code).

export type VinResult =
  | {
      valid: true;
      vin: string;
      wmi: string;
      vds: string;
      vis: string;
      checkDigit: string;
      checkDigitMatches: boolean;
    }
  | { valid: false; code: "VIN_LENGTH" | "VIN_CHARACTER" | "VIN_CHECK_DIGIT"; message: string };

const LETTER_VALUES: Record<string, number> = {
  A: 1,
  B: 2,
  C: 3,
  D: 4,
  E: 5,
  F: 6,
  G: 7,
  H: 8,
  J: 1,
  K: 2,
  L: 3,
  M: 4,
  N: 5,
  P: 7,
  R: 9,
  S: 2,
  T: 3,
  U: 4,
  V: 5,
  W: 6,
  X: 7,
  Y: 8,
  Z: 9,
};
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

/** The check digit a 17-character VIN should carry at position 9 ("0"–"9" or "X"). */
export function vinCheckDigit(vin: string): string {
  let sum = 0;
  for (let i = 0; i < 17; i++) {
    const ch = vin[i];
    const v = ch >= "0" && ch <= "9" ? ch.charCodeAt(0) - 48 : LETTER_VALUES[ch];
    if (v === undefined) throw new Error(`"${ch}" cannot appear in a VIN`); // callers validate first
    sum += v * WEIGHTS[i];
  }
  const r = sum % 11;
  return r === 10 ? "X" : String(r);
}

export function validateVin(input: string, options?: { requireCheckDigit?: boolean }): VinResult {
  const vin = String(input ?? "")
    .replace(/[\s-]/g, "")
    .toUpperCase(); // spaces and dashes are how people copy it
  if (vin.length !== 17) {
    return {
      valid: false,
      code: "VIN_LENGTH",
      message: `A VIN has 17 characters; this one has ${vin.length}.`,
    };
  }
  for (let i = 0; i < 17; i++) {
    const ch = vin[i];
    if (ch === "I" || ch === "O" || ch === "Q") {
      const like = ch === "I" ? "1" : "0";
      return {
        valid: false,
        code: "VIN_CHARACTER",
        message: `Character ${i + 1} is ${ch}, which a VIN never uses; it is probably ${like}.`,
      };
    }
    if (!/[0-9A-Z]/.test(ch)) {
      return {
        valid: false,
        code: "VIN_CHARACTER",
        message: `Character ${i + 1} ("${ch}") is not a digit or capital letter.`,
      };
    }
  }
  const expected = vinCheckDigit(vin);
  const matches = vin[8] === expected;
  if (options?.requireCheckDigit && !matches) {
    return {
      valid: false,
      code: "VIN_CHECK_DIGIT",
      message: `The check digit (character 9) is ${vin[8]} but the rest of the VIN gives ${expected}; one character is probably mistyped.`,
    };
  }
  return {
    valid: true,
    vin,
    wmi: vin.slice(0, 3),
    vds: vin.slice(3, 9),
    vis: vin.slice(9),
    checkDigit: vin[8],
    checkDigitMatches: matches,
  };
}
