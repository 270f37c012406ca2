import { QUANTITIES, type Quantity } from "./dimensions";
import { UNITS, type UnitDef } from "./unit-table";

export type { UnitDef } from "./unit-table";

/**
 * Spelling-tolerant key for a unit: "N m", "N*m", "N⋅m", "N.m" → "N·m"; "m^2", "m²" → "m2";
 * "Ω" (ohm sign) and "Ω" (omega) agree. Case is kept: mW and MW must differ.
 */
export function unitKey(text: string): string {
  return text
    .normalize("NFKC")
    .trim()
    .replace(/\s*\/\s*/g, "/")
    .replace(/\^/g, "")
    .replace(/\s*[*⋅·.]\s*|\s+/g, "·");
}

const BY_KEY = new Map<string, UnitDef>();
for (const u of UNITS) {
  for (const spelling of [u.symbol, ...(u.aliases ?? [])]) BY_KEY.set(unitKey(spelling), u);
}

export function findUnit(text: string): UnitDef | undefined {
  return BY_KEY.get(unitKey(text));
}

/** Units of one quantity, canonical symbols, for help texts and messages. */
export function unitsOf(q: Quantity): string[] {
  return UNITS.filter((u) => u.quantity === q && u.symbol !== "").map((u) => u.symbol);
}

function suggestion(text: string): string {
  const lower = unitKey(text).toLowerCase();
  const hits = [...new Set(UNITS.filter((u) => [u.symbol, ...(u.aliases ?? [])].some((s) => unitKey(s).toLowerCase() === lower)))];
  return hits.length > 0 ? ` (did you mean ${hits.map((u) => u.symbol).join(" or ")}?)` : "";
}

export function unknownUnitMessage(text: string): string {
  return `unknown unit "${text.trim()}"${suggestion(text)}`;
}

export function toSI(value: number, unit: UnitDef): number {
  return unit.per === undefined ? value * unit.to_si : (value * unit.to_si) / unit.per;
}

export function fromSI(value_si: number, unit: UnitDef): number {
  return unit.per === undefined ? value_si / unit.to_si : (value_si * unit.per) / unit.to_si;
}

/** "expected Ah (charge), got kWh (energy)" */
export function mismatchMessage(expectedUnit: string, expected: Quantity, gotUnit: string, got: Quantity): string {
  const exp = expectedUnit ? `${expectedUnit} (${QUANTITIES[expected].label})` : QUANTITIES[expected].label;
  return `expected ${exp}, got ${gotUnit} (${QUANTITIES[got].label})`;
}

/**
 * Typographic symbols people paste from documents: the minus sign (U+2212) and the
 * multiplication sign. One character each, so positions in messages stay right.
 */
export function normaliseSymbols(text: string): string {
  return text.replace(/\u2212/g, "-").replace(/\u00d7/g, "*");
}

export const NUMBER_PATTERN = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?/;

export interface Measured {
  /** the number as written, in `unit` */
  value: number;
  unit: UnitDef;
  value_si: number;
  /** index of the unit in the text (for messages), absent for a bare number */
  unit_at?: number;
}

export type ParseMeasured =
  | { ok: true; measured: Measured }
  | { ok: false; message: string; at: number }
  | { ok: false; notLiteral: true };

/**
 * A literal "number [unit]" such as "90 km/h", "5 %", "1.6 L", "0.3". Anything that does not
 * start with a number followed only by a unit (e.g. "2 * m") is reported as notLiteral so the
 * caller can treat it as a formula. A bare number gets the unit `bareUnit`.
 */
export function parseMeasured(text: string, bareUnit: UnitDef): ParseMeasured {
  const lead = text.length - text.trimStart().length;
  const body = text.trim();
  const num = NUMBER_PATTERN.exec(body);
  if (!num) return { ok: false, notLiteral: true };
  const rest = body.slice(num[0].length);
  if (rest.trim() === "") return measured(Number(num[0]), bareUnit);
  // a letter, %, Ω or µ right after the number starts a unit; operators mean a formula
  if (!/^\s*[A-Za-z%ΩΩµ°]/.test(rest)) return { ok: false, notLiteral: true };
  const unitText = rest.trim();
  const unit = findUnit(unitText);
  if (unit) return measured(Number(num[0]), unit, lead + num[0].length + (rest.length - rest.trimStart().length));
  if (/[()+\-*^,[\]<>=]/.test(unitText)) return { ok: false, notLiteral: true };
  const at = lead + num[0].length + (rest.length - rest.trimStart().length);
  const hint = /^[A-Za-z_]\w*$/.test(unitText) && !suggestion(unitText) ? ` (for a product write ${num[0]} * ${unitText})` : "";
  return { ok: false, message: unknownUnitMessage(unitText) + hint, at };
}

function measured(value: number, unit: UnitDef, unit_at?: number): ParseMeasured {
  return { ok: true, measured: { value, unit, value_si: toSI(value, unit), unit_at } };
}
