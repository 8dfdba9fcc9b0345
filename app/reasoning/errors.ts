// Every way the reasoning core can refuse its input. The server shows `message` to a senior
// curating the knowledge base, so it names the offending id and says what would fix it.

export const REASONING_ERROR_CODES = [
  "EMPTY_MODEL", // no causes at all
  "INVALID_INPUT", // the shape is wrong (from the zod schemas)
  "DUPLICATE_ID", // two causes, symptoms or checks share an id
  "UNKNOWN_ID", // a link, check, observation or finding names an id that is not in the model
  "INVALID_PROBABILITY", // a probability outside [0, 1] or not a number
  "INVALID_PRIOR", // a negative or non-finite base rate / count
  "ZERO_PRIOR", // every candidate has prior 0, so nothing can be ranked
  "INVALID_COST", // a cost that is negative, zero or not a number
  "CYCLE", // the cause tree loops back on itself
  "DUPLICATE_LINK", // the same symptom–cause or check–cause pair given twice
  "CONFLICTING_EVIDENCE", // the same symptom or check recorded with both results by the same source
  "IMPOSSIBLE_EVIDENCE", // no candidate (not even "not in the knowledge base") can explain the evidence
  "ALREADY_RECORDED", // what-if asked about a check that already has a finding
  "INVALID_OPTION", // an option outside its range
] as const;

export type ReasoningErrorCode = (typeof REASONING_ERROR_CODES)[number];

export class ReasoningError extends Error {
  readonly code: ReasoningErrorCode;
  constructor(code: ReasoningErrorCode, message: string) {
    super(message);
    this.name = "ReasoningError";
    this.code = code;
  }
}

export function fail(code: ReasoningErrorCode, message: string): never {
  throw new ReasoningError(code, message);
}

// Shared guards. NaN and ±Infinity fail every comparison below, so they are caught too. `what`
// is a function so the message is only built when the check fails (they run per link).
export function checkProbability(p: unknown, what: () => string): number {
  if (typeof p !== "number" || !(p >= 0 && p <= 1)) {
    fail("INVALID_PROBABILITY", `${what()} is ${String(p)}; a probability must be between 0 and 1.`);
  }
  return p;
}

export function checkCostValue(c: unknown, what: () => string): number {
  if (typeof c !== "number" || !(c > 0 && c < Infinity)) {
    fail("INVALID_COST", `${what()} is ${String(c)}; a cost must be a positive number.`);
  }
  return c;
}
