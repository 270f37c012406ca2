import { Parser } from "expr-eval-fork";

/**
 * The one expr-eval-fork parser configuration we allow (STACK.md "safe pattern"):
 * no member access, no assignment or function definition, no arrays, strings, comparisons,
 * conditionals or random; only the maths functions below; constants PI and E.
 */
export const FORMULA_MAX_LENGTH = 500;
export const FORMULA_MAX_DEPTH = 32;

/** Prefix operators kept (expr-eval calls them unary ops); how each treats dimensions is in dimension-check.ts. */
export const UNARY_FUNCTIONS = [
  "sqrt", "cbrt", "abs", "exp", "log", "ln", "log10", "lg", "log2",
  "sin", "cos", "tan", "asin", "acos", "atan", "sinh", "cosh", "tanh",
  "floor", "ceil", "round", "trunc", "sign",
] as const;
export const CALL_FUNCTIONS = ["min", "max", "pow", "atan2", "hypot"] as const;
export const CONSTANTS = ["PI", "E"] as const;

/** Words refused outright, whatever the scope holds, so the message is clear. */
export const FORBIDDEN_NAMES = new Set([
  "constructor", "__proto__", "prototype", "this", "process", "globalThis", "window",
  "Function", "eval", "require", "import", "Object", "toString", "valueOf", "__defineGetter__",
]);

export function isReservedName(name: string): boolean {
  return (
    FORBIDDEN_NAMES.has(name) ||
    (UNARY_FUNCTIONS as readonly string[]).includes(name) ||
    (CALL_FUNCTIONS as readonly string[]).includes(name) ||
    (CONSTANTS as readonly string[]).includes(name)
  );
}

type NumFn = (...args: number[]) => number;

function nullProto<T>(entries: [string, T][]): Record<string, T> {
  const o = Object.create(null) as Record<string, T>;
  for (const [k, v] of entries) o[k] = v;
  return o;
}

let shared: Parser | undefined;

export function safeParser(): Parser {
  if (shared) return shared;
  const p = new Parser({
    allowMemberAccess: false,
    operators: {
      assignment: false, fndef: false, in: false, random: false, length: false, logical: false,
      comparison: false, conditional: false, concatenate: false, factorial: false, remainder: false,
      // "array" is accepted at run time by expr-eval-fork but missing from its typings
      ...({ array: false } as object),
    },
  });
  const unary = p.unaryOps as Record<string, NumFn>;
  p.unaryOps = nullProto<NumFn>([
    ["-", (x) => -x],
    ["+", (x) => Number(x)],
    ...UNARY_FUNCTIONS.map((n): [string, NumFn] => [n, unary[n]]),
  ]);
  p.functions = nullProto<NumFn>([
    ["min", Math.min], ["max", Math.max], ["pow", Math.pow], ["atan2", Math.atan2], ["hypot", Math.hypot],
  ]);
  p.consts = nullProto<number>([["PI", Math.PI], ["E", Math.E]]);
  // expr-eval looks names up with `in`: on plain objects "toString" or "hasOwnProperty" would be
  // found on Object.prototype and parsed as operators, so every table is null-prototype.
  const binary = (p as unknown as { binaryOps: Record<string, (a: number, b: number) => number> }).binaryOps;
  (p as unknown as { binaryOps: object }).binaryOps = nullProto(["+", "-", "*", "/", "^"].map((op) => [op, binary[op]]));
  (p as unknown as { ternaryOps: object }).ternaryOps = nullProto([]);
  shared = p;
  return p;
}
