import { QUANTITIES, isDimensionless, sameDimension, describeDimension, type Quantity, type Dimension } from "./dimensions";
import { evaluateFormula, identifiers, type Scope, type ScopeValue } from "./formula";
import { rewriteUnitLiterals } from "./formula-units";
import { isReservedName } from "./safe-parser";
import { findUnit, fromSI, mismatchMessage, normaliseSymbols, parseMeasured, toSI, unknownUnitMessage, type Measured, type UnitDef } from "./units";

export type { Scope, ScopeValue } from "./formula";

/**
 * A parameter text is one of
 *   - a number with an optional unit: "90 km/h", "5 %", "0.30" (a bare number is in the
 *     field's own unit),
 *   - a formula over named parameters, numbers may carry units: "2 * base_mass",
 *     "base_mass + 100 kg", optionally ending in a unit in brackets: "n_cells * 3.7 [V]".
 * Formulas compute in SI. A result to which a unit contributed is an SI quantity and must have
 * the field's dimension; a bare-number result is read in the bracket unit, else in the field's.
 * docs/notebook.md has the full rules.
 */
export interface Environment {
  scope: Scope;
  /** parameters that exist but failed, with their message */
  broken: ReadonlyMap<string, string>;
}

export const EMPTY_ENV: Environment = { scope: new Map(), broken: new Map() };

export interface ValueSpec {
  quantity: Quantity;
  /** unit symbol a bare number is read in, and the unit of `value` in the result */
  unit: string;
  integer?: boolean;
}

export type ValueResult =
  | { ok: true; value: number; value_si: number; names: string[] }
  | { ok: false; message: string; at?: number };

interface Split {
  body: string;
  bracket?: { text: string; at: number };
}

/** Splits a trailing "[unit]" off a text. */
export function splitBracketUnit(text: string): Split {
  const m = /\[([^\]]*)\]\s*$/.exec(text);
  if (!m) return { body: text };
  return { body: text.slice(0, m.index), bracket: { text: m[1].trim(), at: m.index + 1 } };
}

function unitOf(spec: ValueSpec): UnitDef {
  // a pure-number field (ratio, count) reads bare numbers as they are
  if (spec.unit === "" && isDimensionless(QUANTITIES[spec.quantity].dim)) return { symbol: "", quantity: spec.quantity, to_si: 1 };
  const u = findUnit(spec.unit);
  if (!u || u.quantity !== spec.quantity) throw new Error(`catalogue error: unit "${spec.unit}" is not a ${spec.quantity} unit`);
  return u;
}

/** Evaluates a field text against the unit and dimension the field expects. */
export function evaluateValue(written: string, spec: ValueSpec, env: Environment = EMPTY_ENV): ValueResult {
  const text = normaliseSymbols(written);
  const fieldUnit = unitOf(spec);
  if (text.trim() === "") return { ok: false, message: "is empty", at: 0 };
  const { body, bracket } = splitBracketUnit(text);
  if (/^\s*[-+]?\d+,\d+\s*[^\s\d,]*\s*$/.test(body)) {
    return { ok: false, message: "write decimals with a point (1.5, not 1,5); commas separate list items", at: body.indexOf(",") };
  }
  if (!bracket) {
    const lit = parseMeasured(body, fieldUnit);
    if (lit.ok) return literalValue(lit.measured, spec, fieldUnit);
    if ("message" in lit) return { ok: false, message: lit.message, at: lit.at };
  }
  return formulaValue(body, bracket, spec, fieldUnit, env);
}

function literalValue(m: Measured, spec: ValueSpec, fieldUnit: UnitDef): ValueResult {
  if (m.unit.quantity !== spec.quantity) {
    return { ok: false, message: mismatchMessage(spec.unit, spec.quantity, m.unit.symbol || "a pure number", m.unit.quantity), at: m.unit_at ?? 0 };
  }
  // the number as written when the units agree: no round-off from a conversion
  const value = m.unit === fieldUnit ? m.value : fromSI(m.value_si, fieldUnit);
  return finish(value, m.value_si, [], spec);
}

function formulaValue(body: string, bracket: Split["bracket"], spec: ValueSpec, fieldUnit: UnitDef, env: Environment): ValueResult {
  const r = evaluateQuantityFormula(body, bracket, env);
  if (!r.ok) return r;
  if (r.readIn && r.readIn.quantity !== spec.quantity) {
    return { ok: false, message: mismatchMessage(spec.unit, spec.quantity, r.readIn.symbol, r.readIn.quantity), at: bracket?.at };
  }
  if (r.pure) return finish(r.value_si, toSI(r.value_si, fieldUnit), r.names, spec);
  if (!sameDimension(r.dim, QUANTITIES[spec.quantity].dim)) {
    const expected = spec.unit ? `${spec.unit} (${QUANTITIES[spec.quantity].label})` : QUANTITIES[spec.quantity].label;
    return { ok: false, message: `expected ${expected}, the formula gives ${describeDimension(r.dim)}`, at: 0 };
  }
  return finish(fromSI(r.value_si, fieldUnit), r.value_si, r.names, spec);
}

function finish(value: number, value_si: number, names: string[], spec: ValueSpec): ValueResult {
  if (!Number.isFinite(value) || !Number.isFinite(value_si)) return { ok: false, message: "is too large: not a finite number (infinite)" };
  if (spec.integer) {
    const rounded = Math.round(value);
    // tolerate float noise from unit conversions, nothing more
    if (Math.abs(value - rounded) > 1e-9 * Math.max(1, Math.abs(value))) return { ok: false, message: `must be a whole number, got ${value}` };
    return { ok: true, value: rounded, value_si: rounded * (value_si / value || 1), names };
  }
  return { ok: true, value, value_si, names };
}

type QuantityFormula =
  | { ok: true; value_si: number; dim: Dimension; pure: boolean; readIn?: UnitDef; names: string[] }
  | { ok: false; message: string; at?: number };

/**
 * A formula with an optional bracket unit. `pure` means the result is a plain number (not yet
 * read in a unit); if a bracket unit is given the number is read in it (then `readIn` is set,
 * value_si is in SI and dim is the bracket unit's).
 */
function evaluateQuantityFormula(body: string, bracket: Split["bracket"], env: Environment): QuantityFormula {
  const r = evaluateFormula(body, env.scope);
  if (!r.ok) {
    const why = r.name === undefined ? undefined : env.broken.get(r.name);
    return why === undefined ? r : { ok: false, message: `parameter "${r.name}" has an error: ${why}`, at: r.at };
  }
  if (!bracket) return { ...r, pure: isDimensionless(r.dim) && !r.si };
  const unit = findUnit(bracket.text);
  if (!unit || unit.symbol === "") return { ok: false, message: unknownUnitMessage(bracket.text), at: bracket.at };
  const unitDim = QUANTITIES[unit.quantity].dim;
  if (isDimensionless(r.dim) && !r.si) return { ok: true, value_si: toSI(r.value_si, unit), dim: unitDim, pure: false, readIn: unit, names: r.names };
  if (!sameDimension(r.dim, unitDim)) {
    return { ok: false, message: `the formula gives ${describeDimension(r.dim)}, not ${unit.symbol} (${QUANTITIES[unit.quantity].label})`, at: bracket.at };
  }
  return { ...r, pure: false, readIn: unit };
}

/** Names a text refers to (parameters or anything else), without unit literals. */
export function referencedNames(text: string): string[] {
  const { body } = splitBracketUnit(text);
  return [...new Set(identifiers(rewriteUnitLiterals(body).text).map((x) => x.name))];
}

export function validParameterName(name: string): string | undefined {
  if (!/^[A-Za-z][A-Za-z0-9_]{0,63}$/.test(name)) {
    return `"${name}" is not a valid name: start with a letter, then letters, digits or _ (at most 64)`;
  }
  if (isReservedName(name)) return `"${name}" is reserved (a function, constant or forbidden word)`;
  return undefined;
}

