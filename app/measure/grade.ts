// How far a reading falls from its rule's limit, as one of four bands, so a finding can count by
// how much it misses and not only by pass or fail. The band comes from the relative miss
//   m = (distance past the limit) / scale        (m ≤ 0 inside the limits, m > 0 outside)
// where the scale is, in the rule's unit: a stated scale if the check gives one, else half the
// window for a two-sided rule (13.8–14.8 V → 0.5 V), else the limit itself (≥ 3 mm → 3 mm).
//   well_within  m ≤ −0.25   passes with a quarter of the scale to spare
//   near         −0.25 < m ≤ 0   passes, close to the limit
//   beyond       0 < m ≤ 0.5     fails by up to half the scale
//   far_beyond   m > 0.5         fails by more (pads under 1.5 mm against a 3 mm line)
// The edges are a modelling choice (common practice, no published source); pads at half the
// advisory line happen to meet the roadworthiness defect line (friction material < 1.5 mm, DVSA
// MOT inspection manual §1.1.13, via SOURCES.md).
import type { MathNode, OperatorNode, RelationalNode } from "mathjs";
import { measureFail } from "./errors";
import { isUnit, math, unitText, type Unit } from "./math";
import { readReading, type ReadingInput } from "./reading";
import { evaluate } from "./rule-eval";
import { compileRule, evaluateRule, type CompiledRule, type RuleResult } from "./rules";

// The band names are the reasoning core's, so a graded finding goes to it as it is.
import { READING_BANDS, type ReadingBand } from "../reasoning/bands";
export { READING_BANDS, type ReadingBand };

/** Relative-miss edges between the bands (see above). */
export const BAND_EDGES = { nearFrom: -0.25, farFrom: 0.5 } as const;

export type GradedReading = RuleResult & {
  band: ReadingBand | null; // null when the rule has no limit to measure from (an "or" rule, a limit of 0 with no scale)
  miss: number | null; // the relative miss m
};

type Bound = { side: "lower" | "upper"; limit: number };

const strip = (n: MathNode): MathNode =>
  n.type === "ParenthesisNode" ? strip((n as MathNode & { content: MathNode }).content) : n;
const isValue = (n: MathNode) => {
  const s = strip(n);
  return s.type === "SymbolNode" && (s as MathNode & { name: string }).name === "value";
};
const UPPER_WHEN_VALUE_LEFT = new Set(["smaller", "smallerEq"]);
const ORDER = new Set(["smaller", "smallerEq", "larger", "largerEq"]);

/** The rule's limits in `unit` (the rule's own unit), or null when it is not a plain window. */
function boundsOf(node: MathNode, unit: string): Bound[] | null {
  const n = strip(node);
  const pair = (fn: string, a: MathNode, b: MathNode): Bound | null => {
    if (!ORDER.has(fn) || isValue(a) === isValue(b)) return null;
    const other = isValue(a) ? b : a;
    const v = evaluate(other, 0);
    if (typeof v === "boolean") return null;
    const limit = isUnit(v) ? (v as Unit).toNumber(unit) : (v as number);
    const upper = isValue(a) ? UPPER_WHEN_VALUE_LEFT.has(fn) : !UPPER_WHEN_VALUE_LEFT.has(fn);
    return { side: upper ? "upper" : "lower", limit };
  };
  if (n.type === "OperatorNode") {
    const op = n as OperatorNode;
    if (op.fn === "and") {
      const parts = op.args.map((a) => boundsOf(a, unit));
      return parts.every((p) => p !== null) ? (parts as Bound[][]).flat() : null;
    }
    const b = op.args.length === 2 ? pair(op.fn, op.args[0], op.args[1]) : null;
    return b ? [b] : null;
  }
  if (n.type === "RelationalNode") {
    const rel = n as RelationalNode;
    const out: Bound[] = [];
    for (let i = 0; i < rel.conditionals.length; i++) {
      const b = pair(rel.conditionals[i], rel.params[i], rel.params[i + 1]);
      if (!b) return null;
      out.push(b);
    }
    return out;
  }
  return null;
}

function bandOf(pass: boolean, m: number): ReadingBand {
  // The rule decides pass or fail (with mathjs's tolerance); the miss only says how far.
  if (pass) return m <= BAND_EDGES.nearFrom ? "well_within" : "near";
  return m > BAND_EDGES.farFrom ? "far_beyond" : "beyond";
}

/**
 * Evaluate a reading against a rule and say how far it falls: `scale` (a quantity in the rule's
 * kind of unit, such as "0.4 V", or a plain number for unitless rules) overrides the default scale.
 */
export function gradeReading(
  rule: string | CompiledRule,
  input: ReadingInput,
  scale?: ReadingInput,
): GradedReading {
  const compiled = typeof rule === "string" ? compileRule(rule) : rule;
  const result = evaluateRule(compiled, input);
  const unit = isUnit(compiled.expected) ? unitText(compiled.expected as Unit) : "";
  const bounds = boundsOf(compiled.tree, unit);
  if (!bounds || bounds.length === 0) return { ...result, band: null, miss: null };
  const x = toRuleUnit(readReading(input).unit, unit);
  let s: number;
  if (scale !== undefined) {
    s = Math.abs(toRuleUnit(readReading(scale).unit, unit, true));
    if (!(s > 0)) measureFail("INVALID_VALUE", "A grading scale must be above 0, such as 0.4 V.");
  } else {
    const lower = bounds.filter((b) => b.side === "lower").map((b) => b.limit);
    const upper = bounds.filter((b) => b.side === "upper").map((b) => b.limit);
    s =
      lower.length && upper.length
        ? (Math.min(...upper) - Math.max(...lower)) / 2
        : Math.abs(bounds[0].limit);
  }
  if (!(s > 0)) return { ...result, band: null, miss: null };
  // Signed distance past each limit: positive outside it, negative inside.
  const past = bounds.map((b) => (b.side === "upper" ? x - b.limit : b.limit - x));
  const miss = Math.max(...past) / s;
  return { ...result, band: bandOf(result.pass, miss), miss };
}

/** A finding for the reasoning engine from a measured check, with its band where the rule has one. */
export function gradedFinding(checkId: string, rule: string, input: ReadingInput, scale?: ReadingInput) {
  const g = gradeReading(rule, input, scale);
  return g.band ? { checkId, result: g.result, band: g.band } : { checkId, result: g.result };
}

// A reading (or a scale, a difference: no offset) as a number in the rule's unit.
function toRuleUnit(u: Unit, unit: string, difference = false): number {
  if (unit === "") return u.toNumber();
  if (u.units.length === 0) measureFail("MISSING_UNIT", `A grading scale needs a unit such as ${unit}.`);
  if (!difference) return u.toNumber(unit);
  // A scale is a difference, so offset units (degC, degF) convert by their factor only.
  return u.toNumber(unit) - math.unit(0, unitText(u)).toNumber(unit);
}
