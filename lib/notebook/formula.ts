import { QUANTITIES, isDimensionless, type Dimension } from "./dimensions";
import { checkDimensions, type Instr } from "./dimension-check";
import { rewriteUnitLiterals, type Rewritten } from "./formula-units";
import { FORBIDDEN_NAMES, FORMULA_MAX_DEPTH, FORMULA_MAX_LENGTH, safeParser } from "./safe-parser";

/** A named value in scope: SI value and its dimension. */
export interface ScopeValue {
  value_si: number;
  dim: Dimension;
  /** true when the value came from a unit (e.g. 5 % → 0.05), false for a bare number */
  si?: boolean;
}
export type Scope = ReadonlyMap<string, ScopeValue>;

export type FormulaResult =
  /** si: the result is an SI quantity (a unit or a unit-carrying name took part), not a bare number */
  | { ok: true; value_si: number; dim: Dimension; names: string[]; si: boolean }
  | { ok: false; message: string; at?: number; name?: string };

const fail = (message: string, at?: number, name?: string): FormulaResult => ({ ok: false, message, at, name });

/** Identifiers in a formula, with their index (for "unknown name" positions and dependencies). */
export function identifiers(text: string): { name: string; at: number }[] {
  const out: { name: string; at: number }[] = [];
  const re = /[A-Za-z_$][A-Za-z0-9_$]*/g;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    const prev = m.index > 0 ? text.charAt(m.index - 1) : "";
    if (/[0-9.]/.test(prev)) continue; // exponent or unit of a number, e.g. 1e5, 2 kg handled elsewhere
    out.push({ name: m[0], at: m.index });
  }
  return out;
}

/** Refusals with clear messages before the text reaches expr-eval (defence in depth). */
function precheck(text: string): FormulaResult | undefined {
  if (text.length > FORMULA_MAX_LENGTH) return fail(`formula too long (${text.length} characters; the limit is ${FORMULA_MAX_LENGTH})`, FORMULA_MAX_LENGTH);
  for (const { name, at } of identifiers(text)) {
    if (FORBIDDEN_NAMES.has(name)) return fail(`"${name}" is not allowed in a formula`, at, name);
  }
  const checks: [RegExp, string][] = [
    [/["'`]/, "quotes (text) are not allowed in a formula"],
    [/=/, "assignments and definitions (=) are not allowed; a formula only computes a value"],
    [/[[\]{}]/, "brackets [ ] and braces { } are not allowed here; a unit in [ ] may only end the formula"],
    [/;/, "only one expression is allowed (no ;)"],
    [/(?<![0-9])\.(?![0-9])|(?<=[A-Za-z_$)\]])\./, "member access (.) is not allowed"],
  ];
  for (const [re, message] of checks) {
    const m = re.exec(text);
    if (m) return fail(message, m.index);
  }
  let depth = 0;
  for (let i = 0; i < text.length; i++) {
    if (text[i] === "(") depth++;
    if (text[i] === ")") depth--;
    if (depth > FORMULA_MAX_DEPTH) return fail(`formula nested too deeply (more than ${FORMULA_MAX_DEPTH} parentheses)`, i);
  }
  return undefined;
}

/** expr-eval's "parse error [line:column]: …" → index in the original text. */
function errorPosition(message: string, rw: Rewritten): number | undefined {
  const m = /\[(\d+):(\d+)\]/.exec(message);
  if (m) {
    // expr-eval columns are 1-based within a line; our formulas are single-line
    const idx = Math.min(Number(m[2]) - 1, rw.origin.length - 1);
    return rw.origin[Math.max(0, idx)];
  }
  if (/EOF/.test(message)) return rw.origin[rw.origin.length - 1];
  return undefined;
}

function cleanMessage(message: string): string {
  return message
    .replace(/^parse error \[\d+:\d+\]:\s*/, "")
    .replace(/^unexpected TEOF: EOF$/, "the formula ends too early")
    .replace(/^Expected EOF$/, "unexpected text (a number and a name need an operator between them, e.g. 2 * x)")
    .replace(/^Expected \)$/, "missing )")
    .replace(/^Unknown character/, "character not allowed:")
    .replace(/^unexpected (TOP|TPAREN|TNUMBER|TNAME|TCOMMA): (.*)$/, 'unexpected "$2"');
}

/**
 * Evaluates a formula over named SI values. Numbers may carry units inline ("100 kg").
 * Returns the SI value and the inferred dimension, or a message with the character index.
 */
export function evaluateFormula(text: string, scope: Scope): FormulaResult {
  const refused = precheck(text);
  if (refused) return refused;
  const rw = rewriteUnitLiterals(text);
  let expr;
  try {
    expr = safeParser().parse(rw.text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    return fail(cleanMessage(msg), errorPosition(msg, rw));
  }
  const dims = new Map<string, Dimension>();
  const values = Object.create(null) as Record<string, number>;
  for (const lit of rw.literals) {
    dims.set(lit.name, QUANTITIES[lit.unit.quantity].dim);
    values[lit.name] = lit.value_si;
  }
  for (const [name, v] of scope) {
    if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(name) || !Number.isFinite(v.value_si)) continue;
    dims.set(name, v.dim);
    values[name] = v.value_si;
  }
  const tokens = (expr as unknown as { tokens: Instr[] }).tokens;
  const checked = checkDimensions(tokens, dims);
  if (!checked.ok) {
    const at = checked.name ? identifiers(text).find((x) => x.name === checked.name)?.at : undefined;
    return fail(checked.message, at, checked.name);
  }
  let result: unknown;
  try {
    result = expr.evaluate(values);
  } catch (e) {
    return fail(cleanMessage(e instanceof Error ? e.message : String(e)));
  }
  if (typeof result !== "number") return fail("the formula does not give a number");
  if (Number.isNaN(result)) return fail("the formula gives no number (e.g. square root or logarithm of a negative value, 0/0)");
  if (!Number.isFinite(result)) return fail("the formula gives an infinite value (division by zero or overflow)");
  const names = [...new Set(identifiers(rw.text).map((x) => x.name).filter((n) => scope.has(n)))];
  const si = rw.literals.length > 0 || names.some((n) => scope.get(n)?.si !== false) || !isDimensionless(checked.dim);
  return { ok: true, value_si: result === 0 ? 0 : result, dim: checked.dim, names, si };
}
