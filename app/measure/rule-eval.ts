// The whitelist that makes knowledge-base rules safe to evaluate. A rule is parsed by mathjs and
// then walked here: only numbers, the symbol `value`, unit names, parentheses and the operators
// below are accepted, and the walk itself evaluates them — nothing is compiled or eval'd.
import type { MathNode, OperatorNode, RelationalNode, SymbolNode } from "mathjs";
import { measureFail } from "./errors";
import { isUnit, math, unitText, type Unit } from "./math";

export type Value = number | boolean | Unit;

const ARITHMETIC = new Set(["add", "subtract", "multiply", "divide", "unaryMinus", "unaryPlus", "pow"]);
const COMPARISONS = new Set(["smaller", "smallerEq", "larger", "largerEq", "equal", "unequal"]);
const LOGIC = new Set(["and", "or", "not"]);

/** Throws UNSUPPORTED_RULE at the first node outside the whitelist. */
export function assertWhitelisted(node: MathNode): void {
  switch (node.type) {
    case "ConstantNode":
      if (typeof (node as MathNode & { value: unknown }).value !== "number") {
        measureFail(
          "UNSUPPORTED_RULE",
          `The rule contains ${node.toString()}; only numbers, value and units are allowed.`,
        );
      }
      return;
    case "SymbolNode": {
      const name = (node as SymbolNode).name;
      if (name !== "value" && !math.Unit.isValuelessUnit(name)) {
        measureFail("UNSUPPORTED_RULE", `The rule uses "${name}", which is neither value nor a unit.`);
      }
      return;
    }
    case "ParenthesisNode":
      return assertWhitelisted((node as MathNode & { content: MathNode }).content);
    case "OperatorNode": {
      const op = node as OperatorNode;
      if (!ARITHMETIC.has(op.fn) && !COMPARISONS.has(op.fn) && !LOGIC.has(op.fn)) {
        measureFail("UNSUPPORTED_RULE", `The rule uses the operator "${op.op}", which rules may not use.`);
      }
      return op.args.forEach(assertWhitelisted);
    }
    case "RelationalNode": {
      const rel = node as RelationalNode;
      if (!rel.conditionals.every((c) => COMPARISONS.has(c)))
        measureFail("UNSUPPORTED_RULE", "The rule chains an unknown comparison.");
      return rel.params.forEach(assertWhitelisted);
    }
    default:
      measureFail(
        "UNSUPPORTED_RULE",
        `The rule contains ${node.type.replace("Node", "").toLowerCase()} syntax (${node.toString()}); rules are comparisons of value with numbers and units.`,
      );
  }
}

/** Evaluate a whitelisted tree with `value` bound to the reading. */
export function evaluate(node: MathNode, value: Value): Value {
  switch (node.type) {
    case "ConstantNode":
      return (node as MathNode & { value: number }).value;
    case "SymbolNode": {
      const name = (node as SymbolNode).name;
      return name === "value" ? value : math.unit(name);
    }
    case "ParenthesisNode":
      return evaluate((node as MathNode & { content: MathNode }).content, value);
    case "OperatorNode": {
      const op = node as OperatorNode;
      const args = op.args.map((a) => evaluate(a, value));
      if (COMPARISONS.has(op.fn)) return compare(op.fn, args[0], args[1]);
      if (LOGIC.has(op.fn)) return logic(op.fn, args);
      if (args.some((a) => typeof a === "boolean"))
        measureFail("RULE_NOT_A_TEST", `The rule does arithmetic on a true/false result: ${op.toString()}.`);
      return arithmetic(op.fn, args);
    }
    case "RelationalNode": {
      const rel = node as RelationalNode;
      const vals = rel.params.map((p) => evaluate(p, value));
      return rel.conditionals.every((c, i) => compare(c, vals[i], vals[i + 1]));
    }
    default:
      return measureFail("UNSUPPORTED_RULE", `The rule contains ${node.type}.`);
  }
}

// Units are converted to the right-hand side's unit and compared as numbers. (mathjs compares
// offset units such as degF and degC by their stored values, which is wrong; converting first is
// right for every unit.) Number comparison uses mathjs's relative tolerance, so 0.16 cm = 1.6 mm.
function compare(fn: string, a: Value, b: Value): boolean {
  if (typeof a === "boolean" || typeof b === "boolean")
    measureFail("RULE_NOT_A_TEST", "The rule compares a true/false result with a number.");
  for (const side of [a, b]) {
    if (isUnit(side) && side.value === null)
      measureFail("BAD_RULE", `The rule has the unit ${unitText(side)} without a number before it.`);
  }
  let x: number;
  let y: number;
  if (isUnit(a) && isUnit(b)) {
    if (!a.equalBase(b))
      measureFail(
        "RULE_UNIT_MISMATCH",
        `The rule compares ${unitText(a)} with ${unitText(b)}, which measure different things.`,
      );
    const target = unitText(b);
    x = a.toNumber(target);
    y = b.toNumber(target);
  } else if (!isUnit(a) && !isUnit(b)) {
    x = a;
    y = b;
  } else {
    const withUnit = (isUnit(a) ? a : b) as Unit;
    if (withUnit.units.length > 0)
      measureFail("RULE_UNIT_MISMATCH", `The rule compares a plain number with ${unitText(withUnit)}.`);
    x = isUnit(a) ? a.toNumber() : a;
    y = isUnit(b) ? b.toNumber() : b;
  }
  return callMath(fn, [x, y]) as boolean;
}

function logic(fn: string, args: Value[]): boolean {
  if (args.some((a) => typeof a !== "boolean"))
    measureFail(
      "RULE_NOT_A_TEST",
      `"${fn}" needs comparisons on both sides, such as value >= 1 mm and value <= 2 mm.`,
    );
  if (fn === "not") return !args[0];
  return fn === "and" ? Boolean(args[0] && args[1]) : Boolean(args[0] || args[1]);
}

function arithmetic(fn: string, args: Value[]): Value {
  try {
    return callMath(fn, args) as Value;
  } catch (e) {
    return measureFail(
      "RULE_UNIT_MISMATCH",
      `The rule's arithmetic does not work out: ${(e as Error).message}`,
    );
  }
}

const callMath = (fn: string, args: Value[]): unknown =>
  (math as unknown as Record<string, (...a: Value[]) => unknown>)[fn](...args);
