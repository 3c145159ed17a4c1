/**
 * A separation profile σ(t) written as a mathjs formula in t (seconds), compiled in a restricted scope.
 *
 * Never `eval`: the formula is parsed by a private mathjs instance whose import, createUnit, evaluate, parse,
 * compile, simplify, derivative and the like are replaced by functions that throw, and every node of the parsed
 * tree is checked against an allow-list (numbers, t, pi, e, arithmetic, comparisons, logic, the conditional
 * a ? b : c, and elementary functions) before it is compiled. Units, strings, matrices, objects, property access,
 * assignments and function definitions are refused. Evaluation must give a finite real number.
 */
import { all, create, type MathNode } from "mathjs";
import { ScenarioInputError } from "../scenario/input-error";

const math = create(all, { number: "number" });
const parseFormula = math.parse;

const disabled = (name: string) => () => {
  throw new Error(`${name} is disabled in profile formulas`);
};
math.import(
  Object.fromEntries(
    ["import", "createUnit", "evaluate", "parse", "compile", "simplify", "derivative", "resolve", "reviver", "chain", "help", "parser", "rationalize"].map(
      (name) => [name, disabled(name)],
    ),
  ),
  { override: true },
);

const allowedSymbols = new Set(["t", "pi", "e"]);
const allowedFunctions = new Set([
  "sin", "cos", "tan", "sec", "csc", "cot", "asin", "acos", "atan", "atan2", "sinh", "cosh", "tanh", "asinh", "acosh",
  "atanh", "exp", "expm1", "log", "log10", "log2", "log1p", "sqrt", "cbrt", "abs", "sign", "min", "max", "pow", "floor",
  "ceil", "round", "mod", "hypot", "erf", "square", "cube",
]);
const allowedOperators = new Set([
  "add", "subtract", "multiply", "divide", "pow", "unaryMinus", "unaryPlus", "mod", "smaller", "larger", "smallerEq",
  "largerEq", "equal", "unequal", "and", "or", "not",
]);
const MAX_NODES = 400;
const MAX_NESTING = 64;

function nestingDepth(expression: string): number {
  let depth = 0;
  let deepest = 0;
  for (const ch of expression) {
    if (ch === "(" || ch === "[" || ch === "{") deepest = Math.max(deepest, ++depth);
    else if (ch === ")" || ch === "]" || ch === "}") depth--;
  }
  return deepest;
}

export interface CompiledProfile {
  /** σ at time t seconds. Throws ScenarioInputError where the formula gives no finite real number. */
  fractionAt(tSeconds: number): number;
}

function refuse(message: string): never {
  throw new ScenarioInputError("protocol.expression", message);
}

function checkNode(node: MathNode, path: string, parent: MathNode | null): void {
  switch (node.type) {
    case "ConstantNode": {
      const value = (node as unknown as { value: unknown }).value;
      if (typeof value !== "number") refuse("only numbers may appear as constants in a profile formula");
      return;
    }
    case "SymbolNode": {
      const name = (node as unknown as { name: string }).name;
      const isFunctionName = parent?.type === "FunctionNode" && path === "fn";
      if (isFunctionName ? !allowedFunctions.has(name) : !allowedSymbols.has(name)) {
        refuse(isFunctionName ? `the function "${name}" is not allowed in a profile formula` : `unknown symbol "${name}": a profile formula may use only t, pi and e`);
      }
      return;
    }
    case "FunctionNode": {
      const fn = (node as unknown as { fn: MathNode }).fn;
      if (fn.type !== "SymbolNode") refuse("only plain function calls are allowed in a profile formula");
      return;
    }
    case "OperatorNode": {
      const fn = (node as unknown as { fn: string }).fn;
      if (!allowedOperators.has(fn)) refuse(`the operator "${(node as unknown as { op: string }).op}" is not allowed in a profile formula`);
      return;
    }
    case "ParenthesisNode":
    case "ConditionalNode":
      return;
    default:
      refuse(`a profile formula may not contain this kind of expression (${node.type.replace(/Node$/, "").toLowerCase()})`);
  }
}

/** Nodes of the formula's parsed tree (what each evaluation walks); 0 when it does not parse. */
export function formulaNodeCount(expression: string): number {
  if (nestingDepth(expression) > MAX_NESTING) return 0;
  try {
    let count = 0;
    parseFormula(expression).traverse(() => count++);
    return count;
  } catch {
    return 0;
  }
}

/** Parses, checks and compiles a profile formula. Throws ScenarioInputError (path "protocol.expression") when refused. */
export function compileProfileFormula(expression: string): CompiledProfile {
  if (nestingDepth(expression) > MAX_NESTING) refuse(`a profile formula may nest brackets at most ${MAX_NESTING} deep`);
  let tree: MathNode;
  try {
    tree = parseFormula(expression);
  } catch (error) {
    refuse(`the formula does not parse: ${(error as Error).message}`);
  }
  let count = 0;
  tree.traverse((node, path, parent) => {
    if (++count > MAX_NODES) refuse(`a profile formula may have at most ${MAX_NODES} terms`);
    checkNode(node, path, parent);
  });
  const compiled = tree.compile();
  return {
    fractionAt(tSeconds: number): number {
      let value: unknown;
      try {
        value = compiled.evaluate({ t: tSeconds });
      } catch (error) {
        refuse(`the formula cannot be evaluated at t = ${tSeconds} s: ${(error as Error).message}`);
      }
      if (typeof value !== "number" || !Number.isFinite(value)) {
        refuse(`the formula gives no finite real number at t = ${tSeconds} s`);
      }
      return value;
    },
  };
}
