// A technician's reading ("0.09 mm", "32 psi", "0.0035 in") as a mathjs Unit. Strict on purpose:
// anything we would have to guess at is refused with a message saying how to write it.
import { measureFail } from "./errors";
import { math, type Unit } from "./math";

export type ReadingInput = string | number | { value: number; unit: string };

export function parseReading(input: ReadingInput): Unit {
  if (typeof input === "number") return fromNumber(input, "");
  if (typeof input === "object" && input !== null) return fromNumber(input.value, input.unit);
  if (typeof input !== "string" || input.trim() === "") {
    measureFail("EMPTY_READING", "No reading was entered. Type the number and its unit, such as 0.05 mm.");
  }
  const text = input.trim();
  if (/\d,\d/.test(text)) {
    measureFail("DECIMAL_COMMA", `"${text}" has a comma. Write decimals with a point (0.09 mm) and no thousands separators.`);
  }
  let u: Unit;
  try {
    u = math.unit(text);
  } catch (e) {
    const unknown = /Unit "([^"]+)" not found/.exec(String((e as Error).message));
    if (unknown) {
      measureFail("UNKNOWN_UNIT", `"${unknown[1]}" is not a unit I know. Use one such as mm, in, kPa, psi, bar, N m, lbf ft, L or degC.`);
    }
    measureFail("BAD_READING", `"${text}" is not a reading. Type a number then its unit, such as 0.05 mm.`);
  }
  if (typeof u.value !== "number" || !Number.isFinite(u.value)) {
    measureFail("BAD_READING", `"${text}" has no number. Type a number then its unit, such as 0.05 mm.`);
  }
  return u;
}

function fromNumber(value: number, unit: string): Unit {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    measureFail("BAD_READING", `${String(value)} is not a number. Type a number then its unit, such as 0.05 mm.`);
  }
  if (unit === "") return math.unit(`${value}`);
  try {
    return math.unit(value, unit);
  } catch {
    measureFail("UNKNOWN_UNIT", `"${unit}" is not a unit I know. Use one such as mm, in, kPa, psi, bar, N m, lbf ft, L or degC.`);
  }
}
