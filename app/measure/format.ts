// Show a quantity in the workshop's unit system. Metric: mm, kPa, N·m, L, km. Imperial (UK): in,
// psi, lbf·ft, UK gallons, miles. US: as imperial but US gallons.
import { describeKind } from "./dimensions";
import { measureFail } from "./errors";
import { math, unitText } from "./math";
import { parseReading, type ReadingInput } from "./reading";

export type UnitSystem = "metric" | "imperial" | "us";
export type QuantityKind = "length" | "pressure" | "torque" | "volume" | "distance";

// [mathjs unit, label shown] per kind and system.
const TARGETS: Record<QuantityKind, Record<UnitSystem, [string, string]>> = {
  length: { metric: ["mm", "mm"], imperial: ["in", "in"], us: ["in", "in"] },
  pressure: { metric: ["kPa", "kPa"], imperial: ["psi", "psi"], us: ["psi", "psi"] },
  torque: { metric: ["N m", "N·m"], imperial: ["lbf ft", "lbf·ft"], us: ["lbf ft", "lbf·ft"] },
  volume: { metric: ["L", "L"], imperial: ["ukgal", "gal (UK)"], us: ["gal", "gal (US)"] },
  distance: { metric: ["km", "km"], imperial: ["mi", "mi"], us: ["mi", "mi"] },
};

export type Formatted = { value: number; unit: string; text: string };

/**
 * Convert and round to `digits` significant figures (default 3), but never round away whole
 * units: 123456 km stays 123456, 0.08890 mm shows as 0.0889.
 */
export function formatQuantity(
  input: ReadingInput,
  kind: QuantityKind,
  system: UnitSystem,
  digits = 3,
): Formatted {
  const target = TARGETS[kind]?.[system];
  if (!target) measureFail("INVALID_VALUE", `Cannot show a ${kind} in the ${system} system.`);
  const [unit, label] = target;
  const reading = parseReading(input);
  const ref = math.unit(unit);
  if (reading.units.length === 0 || !reading.equalBase(ref)) {
    const example = `1 ${TARGETS[kind].metric[0]}`;
    const got = reading.units.length === 0 ? "has no unit" : `is in ${unitText(reading)}`;
    measureFail(
      "UNIT_MISMATCH",
      `That value ${got}; it should be ${describeKind(math.unit(example), example)}, such as ${example}.`,
    );
  }
  const value = reading.toNumber(unit);
  const text = `${round(value, digits)} ${label}`;
  return { value, unit: label, text };
}

function round(v: number, digits: number): string {
  if (v === 0) return "0";
  const magnitude = Math.floor(Math.log10(Math.abs(v)));
  const decimals = Math.min(20, Math.max(0, digits - 1 - magnitude));
  const fixed = v.toFixed(decimals);
  return decimals > 0 ? fixed.replace(/\.?0+$/, "") : fixed;
}
