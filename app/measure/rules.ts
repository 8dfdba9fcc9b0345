// Measurement rules from the knowledge base: a mathjs comparison over `value` that is true when
// the reading PASSES, e.g. "value <= 0.05 mm" or "1.6 mm <= value". A reading of the wrong kind
// (kPa for a length) or without a unit is an error with a message, never a silent pass.
import type { MathNode, OperatorNode, RelationalNode } from "mathjs";
import { describeKind } from "./dimensions";
import { MeasureError, measureFail } from "./errors";
import { isUnit, math, unitText, type Unit } from "./math";
import { readReading, type ReadingInput } from "./reading";
import { assertWhitelisted, evaluate, type Value } from "./rule-eval";

export type CompiledRule = {
  source: string;
  expected: Unit | number | null; // what `value` is compared with: fixes the kind of reading needed
  example: string; // "0.05 mm", quoted in messages
  tree: MathNode;
};

export type RuleResult = {
  pass: boolean;
  result: "pass" | "fail";
  reading: string; // the reading in the rule's unit, e.g. "0.0889 mm"
};

const cache = new Map<string, CompiledRule>();

export function compileRule(source: string): CompiledRule {
  const hit = cache.get(source);
  if (hit) return hit;
  if (typeof source !== "string" || source.trim() === "")
    measureFail("BAD_RULE", "The check has an empty rule.");
  let tree: MathNode;
  try {
    tree = math.parse(source);
  } catch (e) {
    measureFail("BAD_RULE", `The rule "${source}" does not read as a formula: ${(e as Error).message}`);
  }
  assertWhitelisted(tree);
  if (!isTest(tree))
    measureFail(
      "RULE_NOT_A_TEST",
      `The rule "${source}" is not a comparison; write it like value <= 0.05 mm.`,
    );
  const bounds = comparedWithValue(tree);
  const first = bounds[0];
  for (const b of bounds.slice(1)) {
    const same =
      isUnit(first.value) && isUnit(b.value)
        ? first.value.equalBase(b.value)
        : isUnit(first.value) === isUnit(b.value);
    if (!same)
      measureFail(
        "RULE_UNIT_MISMATCH",
        `The rule "${source}" compares value with both ${first.text} and ${b.text}.`,
      );
  }
  const compiled: CompiledRule = { source, expected: first?.value ?? null, example: first?.text ?? "", tree };
  if (cache.size > 1000) cache.clear(); // a bound, not an LRU: rules are few and re-parsing is cheap
  cache.set(source, compiled);
  return compiled;
}

/** Evaluate a reading against a rule: pass when the rule is true. */
export function evaluateRule(rule: string | CompiledRule, input: ReadingInput): RuleResult {
  const compiled = typeof rule === "string" ? compileRule(rule) : rule;
  const { unit: reading, percent } = readReading(input);
  checkKind(compiled, reading, percent);
  let out: Value;
  try {
    out = evaluate(compiled.tree, reading);
  } catch (e) {
    // With `value` inside arithmetic the kind is only known while evaluating: blame the reading.
    if (e instanceof MeasureError && e.code === "RULE_UNIT_MISMATCH" && compiled.expected === null) {
      measureFail(
        "UNIT_MISMATCH",
        `That reading is in ${unitText(reading) || "no unit"}, which the rule ${compiled.source} cannot use.`,
      );
    }
    throw e;
  }
  if (typeof out !== "boolean")
    measureFail("RULE_NOT_A_TEST", `The rule "${compiled.source}" did not come out true or false.`);
  const target = isUnit(compiled.expected) ? unitText(compiled.expected) : unitText(reading);
  const shown = target
    ? `${+reading.toNumber(target).toPrecision(6)} ${target}`
    : `${+reading.toNumber().toPrecision(6)}`;
  return { pass: out, result: out ? "pass" : "fail", reading: shown };
}

/** A finding for the reasoning engine from a measured check. */
export function findingFromReading(checkId: string, rule: string, input: ReadingInput) {
  return { checkId, result: evaluateRule(rule, input).result };
}

export { MeasureError };

function checkKind(rule: CompiledRule, reading: Unit, percent: boolean): void {
  const { expected, example } = rule;
  if (expected === null) return; // value only appears inside arithmetic; evaluation will catch mismatches
  const has = reading.units.length > 0;
  if (!isUnit(expected)) {
    // Ratio checks compare percent figures: "65 %" and "65" are the same reading.
    if (has)
      measureFail(
        "UNEXPECTED_UNIT",
        `That reading is in ${unitText(reading)}; this check needs a plain number or a percentage, such as ${example}.`,
      );
    return;
  }
  const needs = describeKind(expected, example);
  if (percent)
    measureFail(
      "UNIT_MISMATCH",
      `That reading is a percentage; this check needs ${needs}, such as ${example}.`,
    );
  if (!has)
    measureFail("MISSING_UNIT", `That reading has no unit; this check needs ${needs}, such as ${example}.`);
  if (!reading.equalBase(expected))
    measureFail(
      "UNIT_MISMATCH",
      `That reading is in ${unitText(reading)}; this check needs ${needs}, such as ${example}.`,
    );
}

const strip = (n: MathNode): MathNode =>
  n.type === "ParenthesisNode" ? strip((n as MathNode & { content: MathNode }).content) : n;
const COMPARE = new Set(["smaller", "smallerEq", "larger", "largerEq", "equal", "unequal"]);

function isTest(node: MathNode): boolean {
  const n = strip(node);
  if (n.type === "RelationalNode") return true;
  if (n.type !== "OperatorNode") return false;
  const op = n as OperatorNode;
  if (COMPARE.has(op.fn)) return true;
  return (op.fn === "and" || op.fn === "or" || op.fn === "not") && op.args.every(isTest);
}

// Every operand compared directly with `value`, evaluated (it holds no `value`, so this is a
// constant). These fix the kind of reading the rule needs, and give the example for messages.
function comparedWithValue(node: MathNode): { value: number | Unit; text: string }[] {
  const found: { value: number | Unit; text: string }[] = [];
  const isValue = (n: MathNode) => {
    const s = strip(n);
    return s.type === "SymbolNode" && (s as MathNode & { name: string }).name === "value";
  };
  const mentionsValue = (n: MathNode) => n.filter((x) => isValue(x)).length > 0;
  const visit = (raw: MathNode): void => {
    const n = strip(raw);
    let operands: MathNode[] = [];
    if (n.type === "RelationalNode") operands = (n as RelationalNode).params;
    else if (n.type === "OperatorNode") {
      const op = n as OperatorNode;
      if (COMPARE.has(op.fn)) operands = op.args;
      else return op.args.forEach(visit); // and / or / not
    }
    operands.forEach((o, i) => {
      const nextToValue =
        (i > 0 && isValue(operands[i - 1])) || (i + 1 < operands.length && isValue(operands[i + 1]));
      if (!nextToValue || mentionsValue(o)) return;
      const v = evaluate(o, 0);
      if (typeof v === "boolean")
        measureFail("RULE_NOT_A_TEST", `The rule compares value with a true/false result: ${o.toString()}.`);
      found.push({ value: v, text: o.toString() });
    });
  };
  visit(node);
  return found;
}
