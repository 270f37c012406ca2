import { QUANTITIES, describeDimension, sameDimension, type Dimension } from "./dimensions";
import { evaluateFormula, type ScopeValue } from "./formula";
import { referencedNames, splitBracketUnit, validParameterName, type Environment } from "./expressions";
import { UNITS } from "./unit-table";
import { findUnit, normaliseSymbols, parseMeasured, toSI, unknownUnitMessage } from "./units";
import { isDimensionless } from "./dimensions";

/** One named parameter as written in a Parameters block. */
export interface ParameterDef {
  name: string;
  text: string;
  blockId?: string;
}

export type ParameterResult =
  | { ok: true; value_si: number; dim: Dimension; unit?: string; names: string[]; si: boolean }
  | { ok: false; message: string; at?: number };

export interface ParameterSet {
  env: Environment;
  results: Map<string, ParameterResult>;
}

const BARE = findUnit("")!;

/**
 * Evaluates one parameter text with no field context: a literal keeps its unit's quantity, a
 * bare number is a pure number, a formula gets the dimension it computes (or the bracket unit's
 * if it computes a pure number).
 */
export function evaluateParameterText(written: string, scope: Environment["scope"]): ParameterResult {
  const r = parameterValue(normaliseSymbols(written), scope);
  if (r.ok && !Number.isFinite(r.value_si)) return { ok: false, message: "is too large: not a finite number (infinite)" };
  return r;
}

function parameterValue(text: string, scope: Environment["scope"]): ParameterResult {
  if (text.trim() === "") return { ok: false, message: "is empty", at: 0 };
  const { body, bracket } = splitBracketUnit(text);
  if (!bracket) {
    const lit = parseMeasured(body, BARE);
    if (lit.ok) {
      const m = lit.measured;
      return { ok: true, value_si: m.value_si, dim: QUANTITIES[m.unit.quantity].dim, unit: m.unit.symbol || undefined, names: [], si: m.unit.symbol !== "" };
    }
    if ("message" in lit) return { ok: false, message: lit.message, at: lit.at };
  }
  const r = evaluateFormula(body, scope);
  if (!r.ok) return r;
  if (!bracket) return { ok: true, value_si: r.value_si, dim: r.dim, names: r.names, si: r.si };
  const unit = findUnit(bracket.text);
  if (!unit || unit.symbol === "") return { ok: false, message: unknownUnitMessage(bracket.text), at: bracket.at };
  const unitDim = QUANTITIES[unit.quantity].dim;
  if (isDimensionless(r.dim) && !r.si) return { ok: true, value_si: toSI(r.value_si, unit), dim: unitDim, unit: unit.symbol, names: r.names, si: true };
  if (!sameDimension(r.dim, unitDim)) {
    return { ok: false, message: `the formula gives ${describeDimension(r.dim)}, not ${unit.symbol}`, at: bracket.at };
  }
  return { ok: true, value_si: r.value_si, dim: r.dim, unit: unit.symbol, names: r.names, si: true };
}

/**
 * Evaluates all parameters in dependency order. Names must be unique; a reference cycle is
 * reported on every parameter in it ("cycle: a → b → a"); a parameter that uses a failed one
 * fails too, naming it.
 */
export function evaluateParameters(defs: readonly ParameterDef[]): ParameterSet {
  const results = new Map<string, ParameterResult>();
  const byName = new Map<string, ParameterDef>();
  for (const d of defs) {
    const bad = validParameterName(d.name);
    if (bad) results.set(d.name, { ok: false, message: bad });
    else if (byName.has(d.name)) results.set(d.name, { ok: false, message: `"${d.name}" is defined twice` });
    else byName.set(d.name, d);
  }
  const deps = new Map<string, string[]>();
  for (const [name, d] of byName) deps.set(name, referencedNames(d.text).filter((n) => byName.has(n)));

  const scope = new Map<string, ScopeValue>();
  const broken = new Map<string, string>();
  const state = new Map<string, "active" | "done">();
  const stack: string[] = [];

  const visit = (name: string): void => {
    if (state.get(name) === "done") return;
    if (state.get(name) === "active") {
      const cycle = [...stack.slice(stack.indexOf(name)), name];
      const message = `cycle: ${cycle.join(" → ")}`;
      for (const n of cycle) if (!results.has(n)) results.set(n, { ok: false, message });
      return;
    }
    state.set(name, "active");
    stack.push(name);
    for (const dep of deps.get(name) ?? []) visit(dep);
    stack.pop();
    state.set(name, "done");
    if (!results.has(name)) {
      const failedDep = (deps.get(name) ?? []).find((dep) => results.get(dep)?.ok === false);
      results.set(
        name,
        failedDep ? { ok: false, message: `uses "${failedDep}", which has an error` } : evaluateParameterText(byName.get(name)!.text, scope),
      );
    }
    const r = results.get(name)!;
    if (r.ok && r.unit === undefined) r.unit = displayUnit(r, results);
    if (r.ok) scope.set(name, { value_si: r.value_si, dim: r.dim, si: r.si });
    else broken.set(name, r.message);
  };
  for (const name of byName.keys()) visit(name);
  for (const [name, r] of results) if (!r.ok && !broken.has(name)) broken.set(name, r.message);
  return { env: { scope, broken }, results };
}

/**
 * A unit to show a formula parameter in: that of the first parameter it uses with the same
 * dimension (2 * base_mass → kg), else the SI unit of its dimension; none for pure numbers.
 */
function displayUnit(r: Extract<ParameterResult, { ok: true }>, results: ReadonlyMap<string, ParameterResult>): string | undefined {
  if (isDimensionless(r.dim)) return undefined;
  for (const n of r.names) {
    const dep = results.get(n);
    if (dep?.ok && dep.unit && sameDimension(dep.dim, r.dim)) return dep.unit;
  }
  return UNITS.find((u) => u.to_si === 1 && u.per === undefined && u.symbol !== "" && sameDimension(QUANTITIES[u.quantity].dim, r.dim))?.symbol;
}
