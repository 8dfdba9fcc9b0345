// A technician's reading ("0.09 mm", "32 psi", "0.0035 in") as a mathjs Unit. Strict on purpose:
// anything we would have to guess at is refused with a message saying how to write it.
import { measureFail } from "./errors";
import { math, type Unit } from "./math";

export type ReadingInput = string | number | { value: number; unit: string };

/** A reading as read: the quantity, and whether it was written as a percentage ("65 %"). */
export type Reading = { unit: Unit; percent: boolean };

// "65 %", "65%", "65 percent", "65 per cent", "65 pc": a ratio written as a percentage.
const PERCENT = /^([-+]?\d+(?:\.\d+)?)\s*(?:%|percent|per\s+cent|pc)$/i;
// "2/32 in", "1 3/16 in", "3/32\"": fractions as tyre gauges and rulers in inches are read.
const FRACTION = /^(?:(\d+)\s+)?(\d+)\s*\/\s*(\d+)\s*("|[a-z][a-z0-9 ^/]*)$/i;

export function parseReading(input: ReadingInput): Unit {
  return readReading(input).unit;
}

/** Like parseReading, and says whether the number was written as a percentage. */
export function readReading(input: ReadingInput): Reading {
  if (typeof input === "number") return { unit: fromNumber(input, ""), percent: false };
  if (typeof input === "object" && input !== null)
    return { unit: fromNumber(input.value, input.unit), percent: false };
  if (typeof input !== "string" || input.trim() === "") {
    measureFail("EMPTY_READING", "No reading was entered. Type the number and its unit, such as 0.05 mm.");
  }
  const percent = PERCENT.exec(input.trim());
  // A percentage is a plain number on the rule's scale: ratio checks compare percent figures.
  if (percent) return { unit: fromNumber(Number(percent[1]), ""), percent: true };
  return { unit: parseText(input.trim()), percent: false };
}

function parseText(raw: string): Unit {
  let text = raw;
  const fraction = FRACTION.exec(text);
  if (fraction) {
    const [, whole, num, den, unitWord] = fraction;
    if (Number(den) === 0)
      measureFail("BAD_READING", `"${raw}" divides by zero. Write a fraction such as 2/32 in.`);
    const value = Number(whole ?? 0) + Number(num) / Number(den);
    // mathjs would read "2/32 in" as 2 ÷ (32 in); the fraction is the number, the word its unit.
    text = `${value} ${unitWord === '"' ? "in" : unitWord.trim()}`;
  }
  if (/\d,\d/.test(text)) {
    measureFail(
      "DECIMAL_COMMA",
      `"${text}" has a comma. Write decimals with a point (0.09 mm) and no thousands separators.`,
    );
  }
  let u: Unit;
  try {
    u = math.unit(text);
  } catch (e) {
    const unknown = /Unit "([^"]+)" not found/.exec(String((e as Error).message));
    if (unknown) {
      measureFail(
        "UNKNOWN_UNIT",
        `"${unknown[1]}" is not a unit I know. Use one such as mm, in, kPa, psi, bar, N m, lbf ft, L or degC.`,
      );
    }
    measureFail("BAD_READING", `"${raw}" is not a reading. Type a number then its unit, such as 0.05 mm.`);
  }
  if (typeof u.value !== "number" || !Number.isFinite(u.value)) {
    measureFail("BAD_READING", `"${raw}" has no number. Type a number then its unit, such as 0.05 mm.`);
  }
  return u;
}

function fromNumber(value: number, unit: string): Unit {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    measureFail(
      "BAD_READING",
      `${String(value)} is not a number. Type a number then its unit, such as 0.05 mm.`,
    );
  }
  if (unit === "") return math.unit(`${value}`);
  try {
    return math.unit(value, unit);
  } catch {
    measureFail(
      "UNKNOWN_UNIT",
      `"${unit}" is not a unit I know. Use one such as mm, in, kPa, psi, bar, N m, lbf ft, L or degC.`,
    );
  }
}
