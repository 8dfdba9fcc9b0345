// Names for kinds of quantity, so errors can say "this check needs a length" instead of
// "dimension mismatch". A kind is recognised by comparing base dimensions with a reference unit.
import { math, type Unit } from "./math";

const KINDS: [name: string, reference: string][] = [
  ["length", "m"],
  ["pressure", "Pa"],
  ["torque", "N m"], // same dimensions as energy; told apart below by the units used
  ["volume", "L"],
  ["mass", "kg"],
  ["temperature", "K"],
  ["time", "s"],
  ["speed", "m/s"],
  ["voltage", "V"],
  ["current", "A"],
  ["resistance", "ohm"],
  ["force", "N"],
  ["power", "W"],
  ["frequency", "Hz"],
  ["angle", "rad"],
  ["area", "m^2"],
];
const REFERENCES = KINDS.map(([name, ref]) => [name, math.unit(ref)] as const);

/** "length", "pressure", … or null when the quantity is not one we have a word for. */
export function kindOf(u: Unit): string | null {
  if (u.units.length === 0) return "plain number";
  for (const [name, ref] of REFERENCES) {
    if (!u.equalBase(ref)) continue;
    // N·m and lbf·ft are torque; J and kWh are energy, though the dimensions are the same.
    if (name === "torque") return u.units.some((c) => c.unit.base.key === "FORCE") ? "torque" : "energy";
    return name;
  }
  return null;
}

/** "a length" / "an angle" / "a quantity like 2 km/h" for messages. */
export function describeKind(u: Unit, example: string): string {
  const kind = kindOf(u);
  if (kind === null) return `a quantity in the same kind of unit as ${example}`;
  if (kind === "plain number") return "a plain number";
  return `${/^[aeiou]/.test(kind) ? "an" : "a"} ${kind}`;
}
