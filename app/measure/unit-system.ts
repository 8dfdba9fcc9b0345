// The workshop's unit system on screens and in forms. Quantities are stored in SI-based units
// (mileage in km, limits as the knowledge base writes them) and shown and read in the workshop's
// own: metric, or imperial as a UK workshop uses it (miles, psi, mpg, inches, lbf·ft, pints) —
// temperatures stay in °C there. Conversions: 1 mile = 1.609344 km, 1 in = 25.4 mm (NIST SP 811
// §B.6, exact); 1 UK pint = 0.56826125 L (Weights and Measures Act 1985, Schedule 1).
import type { MathNode } from "mathjs";
import { kindOf } from "./dimensions";
import { math, type Unit } from "./math";

import { type UnitSystem } from "./mileage";

export { formatMileage, KM_PER_MILE, mileageUnit, parseDecimal, parseMileage, type Parsed } from "./mileage";
export type { UnitSystem };

const TARGET: Record<string, string> = {
  length: "in",
  pressure: "psi",
  torque: "lbf ft",
  volume: "ukpint",
  mass: "lb",
  speed: "mi/h",
};
const LABEL: Record<string, string> = {
  in: "in",
  psi: "psi",
  "lbf ft": "lbf·ft",
  ukpint: "pt",
  lb: "lb",
  "mi/h": "mph",
};

function round(v: number, digits = 3): string {
  if (v === 0) return "0";
  const decimals = Math.min(6, Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(v)))));
  return String(+v.toFixed(decimals));
}

/** A limit or reading in the workshop's system, with the stored figure beside it when converted. */
export function showQuantity(u: Unit, system: UnitSystem): string {
  const own = u.units.length ? `${round(u.toNumber())} ${u.formatUnits()}` : round(u.toNumber());
  if (system === "metric" || !u.units.length) return own;
  const kind = kindOf(u);
  const target = kind ? TARGET[kind] : undefined;
  if (!target || u.units.some((c) => c.unit.name === target.split(" ")[0])) return own;
  return `${round(u.toNumber(target))} ${LABEL[target]} (${own})`;
}

const PHRASE: Record<string, string> = {
  smallerEq: "at most",
  largerEq: "at least",
  smaller: "below",
  larger: "above",
};
const FLIP: Record<string, string> = {
  smallerEq: "largerEq",
  largerEq: "smallerEq",
  smaller: "larger",
  larger: "smaller",
};

/**
 * A measurement rule (true when the reading passes) in words, in the workshop's units:
 * "value <= 0.05 mm" → "at most 0.05 mm", or for imperial "at most 0.00197 in (0.05 mm)".
 * A rule this cannot put into words comes back as it is written.
 */
export function describeRule(rule: string, system: UnitSystem): string {
  try {
    return phrase(math.parse(rule), system);
  } catch {
    return rule.replace(/\bvalue\s*/g, "").trim();
  }
}

function phrase(node: MathNode, system: UnitSystem): string {
  const n = node as MathNode & {
    op?: string;
    fn?: string;
    args?: MathNode[];
    content?: MathNode;
    conditionals?: string[];
    params?: MathNode[];
  };
  if (n.type === "ParenthesisNode" && n.content) return phrase(n.content, system);
  if (n.type === "OperatorNode" && (n.fn === "and" || n.fn === "or") && n.args)
    return n.args.map((a) => phrase(a, system)).join(` ${n.fn} `);
  let pairs: [string, MathNode, MathNode][] = [];
  if (n.type === "OperatorNode" && n.fn && PHRASE[n.fn] && n.args) pairs = [[n.fn, n.args[0], n.args[1]]];
  else if (n.type === "RelationalNode" && n.conditionals && n.params)
    pairs = n.conditionals.map((c, i) => [c, n.params![i], n.params![i + 1]]);
  if (!pairs.length) throw new Error("not a comparison");
  return pairs
    .map(([fn, a, b]) => {
      const isValue = (x: MathNode) =>
        x.type === "SymbolNode" && (x as MathNode & { name: string }).name === "value";
      if (!isValue(a) && !isValue(b)) throw new Error("no value");
      const [op, other] = isValue(a) ? [fn, b] : [FLIP[fn], a];
      const limit = other.compile().evaluate({}) as Unit | number;
      const shown = typeof limit === "number" ? round(limit) : showQuantity(limit, system);
      return `${PHRASE[op]} ${shown}`;
    })
    .join(" and ");
}
