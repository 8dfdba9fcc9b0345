// Typed errors of the measurement module. `message` is written for a technician at the bench:
// what is wrong with the reading or rule, and an example of what is expected.

export const MEASURE_ERROR_CODES = [
  "EMPTY_READING", // nothing typed
  "BAD_READING", // not "number unit"
  "DECIMAL_COMMA", // "0,09 mm": refused rather than guessed (it could be a thousands separator)
  "UNKNOWN_UNIT", // a unit mathjs does not know
  "MISSING_UNIT", // a plain number where the rule needs a unit
  "UNEXPECTED_UNIT", // a unit where the rule compares plain numbers
  "UNIT_MISMATCH", // a unit of the wrong kind (kPa for a length)
  "BAD_RULE", // the rule text does not parse
  "UNSUPPORTED_RULE", // the rule uses something outside the whitelist (functions, strings, assignments, …)
  "RULE_NOT_A_TEST", // the rule does not come out true or false
  "RULE_UNIT_MISMATCH", // the rule mixes kinds of unit (mm and kPa)
  "INVALID_VALUE", // e.g. a fuel consumption of 0 or below
] as const;

export type MeasureErrorCode = (typeof MEASURE_ERROR_CODES)[number];

export class MeasureError extends Error {
  readonly code: MeasureErrorCode;
  constructor(code: MeasureErrorCode, message: string) {
    super(message);
    this.name = "MeasureError";
    this.code = code;
  }
}

export function measureFail(code: MeasureErrorCode, message: string): never {
  throw new MeasureError(code, message);
}
