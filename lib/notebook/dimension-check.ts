import {
  DIMENSIONLESS, describeDimension, isDimensionless, multiplyDimensions, powerDimension, sameDimension,
  type Dimension,
} from "./dimensions";
import { CALL_FUNCTIONS, UNARY_FUNCTIONS } from "./safe-parser";

/**
 * Walks expr-eval's postfix instruction list (Expression.tokens, not in its typings) to
 * (1) refuse anything but numbers, known names, arithmetic and allow-listed functions, and
 * (2) infer the dimension of the result. Names hold SI values, so arithmetic on dimensions
 * is exact: + and − need equal dimensions, × and ÷ combine them, ^ needs a constant exponent.
 */
export interface Instr {
  type: string;
  value: unknown;
}

type Entry =
  | { kind: "value"; dim: Dimension; constant?: number }
  | { kind: "function"; name: string };

export type DimResult = { ok: true; dim: Dimension } | { ok: false; message: string; name?: string };

class DimError extends Error {
  constructor(message: string, readonly name_?: string) {
    super(message);
  }
}

// keep the dimension of their argument
const PRESERVING = new Set(["abs", "floor", "ceil", "round", "trunc"]);
const isUnary = (n: string) => (UNARY_FUNCTIONS as readonly string[]).includes(n);
const isCall = (n: string) => (CALL_FUNCTIONS as readonly string[]).includes(n);

export function checkDimensions(tokens: readonly Instr[], dims: ReadonlyMap<string, Dimension>): DimResult {
  try {
    const stack: Entry[] = [];
    for (const t of tokens) step(t, stack, dims);
    if (stack.length !== 1) throw new DimError("not a single expression");
    return { ok: true, dim: value(stack.pop()).dim };
  } catch (e) {
    if (e instanceof DimError) return { ok: false, message: e.message, name: e.name_ };
    throw e;
  }
}

function value(e: Entry | undefined): { dim: Dimension; constant?: number } {
  if (!e) throw new DimError("incomplete formula");
  if (e.kind === "function") throw new DimError(`${e.name} must be called with arguments in parentheses`);
  return e;
}

function step(t: Instr, stack: Entry[], dims: ReadonlyMap<string, Dimension>): void {
  switch (t.type) {
    case "INUMBER":
      if (typeof t.value !== "number") throw new DimError("only numbers are allowed (no text or true/false)");
      stack.push({ kind: "value", dim: DIMENSIONLESS, constant: t.value });
      return;
    case "IVAR":
      return pushName(String(t.value), stack, dims);
    case "IOP1":
      stack.push(unary(String(t.value), value(stack.pop())));
      return;
    case "IOP2": {
      const b = value(stack.pop());
      const a = value(stack.pop());
      stack.push(binary(String(t.value), a, b));
      return;
    }
    case "IFUNCALL":
      stack.push(call(Number(t.value), stack));
      return;
    default:
      throw new DimError("only arithmetic and the listed maths functions are allowed");
  }
}

function pushName(name: string, stack: Entry[], dims: ReadonlyMap<string, Dimension>): void {
  if (isCall(name)) return void stack.push({ kind: "function", name });
  const dim = dims.get(name);
  if (!dim) throw new DimError(`unknown name "${name}"`, name);
  stack.push({ kind: "value", dim });
}

function unary(op: string, a: { dim: Dimension; constant?: number }): Entry {
  const c = a.constant;
  if (op === "-" || op === "+") return { kind: "value", dim: a.dim, constant: c === undefined ? undefined : op === "-" ? -c : c };
  if (!isUnary(op)) throw new DimError(`"${op}" is not allowed`);
  if (PRESERVING.has(op)) return { kind: "value", dim: a.dim };
  if (op === "sqrt" || op === "cbrt") {
    const root = op === "sqrt" ? 2 : 3;
    const d = powerDimension(a.dim, 1 / root);
    if (!d.every((x) => Number.isInteger(x))) throw new DimError(`${op} of ${describeDimension(a.dim)} has no unit we know`);
    return { kind: "value", dim: d };
  }
  if (op === "sign") return { kind: "value", dim: DIMENSIONLESS };
  if (!isDimensionless(a.dim)) throw new DimError(`${op} needs a pure number, got ${describeDimension(a.dim)}`);
  return { kind: "value", dim: DIMENSIONLESS };
}

function binary(op: string, a: { dim: Dimension; constant?: number }, b: { dim: Dimension; constant?: number }): Entry {
  const fold = (f: (x: number, y: number) => number) =>
    a.constant !== undefined && b.constant !== undefined ? f(a.constant, b.constant) : undefined;
  switch (op) {
    case "+":
    case "-":
      if (!sameDimension(a.dim, b.dim)) {
        throw new DimError(`cannot ${op === "+" ? "add" : "subtract"} ${describeDimension(a.dim)} and ${describeDimension(b.dim)}`);
      }
      return { kind: "value", dim: a.dim, constant: fold(op === "+" ? (x, y) => x + y : (x, y) => x - y) };
    case "*":
      return { kind: "value", dim: multiplyDimensions(a.dim, b.dim), constant: fold((x, y) => x * y) };
    case "/":
      return { kind: "value", dim: multiplyDimensions(a.dim, b.dim, -1), constant: fold((x, y) => x / y) };
    case "^":
      return { kind: "value", dim: power(a, b), constant: fold(Math.pow) };
    default:
      throw new DimError(`operator "${op}" is not allowed`);
  }
}

function power(a: { dim: Dimension }, b: { dim: Dimension; constant?: number }): Dimension {
  if (!isDimensionless(b.dim)) throw new DimError(`an exponent must be a pure number, got ${describeDimension(b.dim)}`);
  if (isDimensionless(a.dim)) return DIMENSIONLESS;
  if (b.constant === undefined) throw new DimError(`${describeDimension(a.dim)} can only be raised to a fixed number`);
  return powerDimension(a.dim, b.constant);
}

function call(argc: number, stack: Entry[]): Entry {
  const args: { dim: Dimension; constant?: number }[] = [];
  for (let k = 0; k < argc; k++) args.unshift(value(stack.pop()));
  const f = stack.pop();
  if (!f || f.kind !== "function") throw new DimError("only the listed maths functions can be called");
  if (f.name === "pow") {
    if (argc !== 2) throw new DimError("pow takes two arguments");
    return { kind: "value", dim: power(args[0], args[1]) };
  }
  if (argc === 0) throw new DimError(`${f.name} needs arguments`);
  const first = args[0].dim;
  if (!args.every((x) => sameDimension(x.dim, first))) {
    throw new DimError(`${f.name} needs arguments of one kind, got ${args.map((x) => describeDimension(x.dim)).join(", ")}`);
  }
  if (f.name === "atan2") return { kind: "value", dim: DIMENSIONLESS };
  return { kind: "value", dim: first };
}
