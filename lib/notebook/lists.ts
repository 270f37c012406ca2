import { EMPTY_ENV, evaluateValue, splitBracketUnit, type Environment, type ValueSpec } from "./expressions";
import { findUnit, fromSI, mismatchMessage, normaliseSymbols, parseMeasured, toSI, unknownUnitMessage, type UnitDef } from "./units";

/**
 * List syntax: items separated by commas, semicolons, tabs or new lines (commas inside
 * parentheses belong to a formula: "min(a, b), 3"). Each item is a value text like a single
 * field. The list's unit is a unit in brackets ending the list ("15, 30, 50, 70 [km/h]") or the
 * unit of the last item when that item is a number with a unit ("15, 30, 50, 70 km/h"); items
 * without a unit of their own are read in it, otherwise in the field's unit.
 */
export const LIST_MAX_ITEMS = 20_000;

const PLAIN_NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?$/;

export type ListResult =
  | { ok: true; values: number[]; values_si: number[] }
  | { ok: false; message: string; at?: number; index?: number };

interface Item {
  text: string;
  at: number;
}

const SEPARATORS = new Set([",", ";", "\t", "\n", "\r"]);

export function splitList(text: string): Item[] {
  const items: Item[] = [];
  let depth = 0;
  let start = 0;
  const push = (end: number) => {
    const raw = text.slice(start, end);
    const trimmed = raw.trim();
    if (trimmed !== "") items.push({ text: trimmed, at: start + (raw.length - raw.trimStart().length) });
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === "(") depth++;
    else if (ch === ")") depth--;
    else if (depth <= 0 && SEPARATORS.has(ch)) {
      push(i);
      start = i + 1;
    }
  }
  push(text.length);
  return items;
}

function listUnit(text: string, items: Item[]): { unit?: UnitDef; body: string } | { error: ListResult } {
  const { body, bracket } = splitBracketUnit(text);
  if (bracket && splitList(body).length > 1) {
    const unit = findUnit(bracket.text);
    if (!unit || unit.symbol === "") return { error: { ok: false, message: unknownUnitMessage(bracket.text), at: bracket.at } };
    return { unit, body };
  }
  const last = items[items.length - 1];
  const lit = parseMeasured(last.text, findUnit("")!);
  if (lit.ok && lit.measured.unit.symbol !== "") return { unit: lit.measured.unit, body: text };
  return { body: text };
}

export function parseList(written: string, spec: ValueSpec, env: Environment = EMPTY_ENV): ListResult {
  const text = normaliseSymbols(written);
  const first = splitList(text);
  if (first.length === 0) return { ok: true, values: [], values_si: [] };
  const lu = listUnit(text, first);
  if ("error" in lu) return lu.error;
  if (lu.unit && lu.unit.quantity !== spec.quantity) {
    return { ok: false, message: mismatchMessage(spec.unit, spec.quantity, lu.unit.symbol, lu.unit.quantity) };
  }
  const items = lu.body === text ? first : splitList(lu.body);
  if (items.length > LIST_MAX_ITEMS) return { ok: false, message: `too many items (${items.length}; the limit is ${LIST_MAX_ITEMS})` };
  const itemSpec: ValueSpec = { ...spec, unit: lu.unit ? lu.unit.symbol : spec.unit };
  const fieldUnit = spec.unit === "" ? undefined : findUnit(spec.unit);
  const values: number[] = [];
  const values_si: number[] = [];
  // fast path for long sample lists: a bare number needs no parser
  const itemUnit = itemSpec.unit === "" ? undefined : findUnit(itemSpec.unit);
  const bare = (text: string) => {
    if (itemSpec.integer || !PLAIN_NUMBER.test(text)) return undefined;
    const value = Number(text);
    const value_si = itemUnit ? toSI(value, itemUnit) : value;
    return Number.isFinite(value_si) ? { ok: true as const, value, value_si } : undefined;
  };
  for (const [index, item] of items.entries()) {
    const r = bare(item.text) ?? evaluateValue(item.text, itemSpec, env);
    if (!r.ok) return { ok: false, message: `item ${index + 1}: ${r.message}`, at: item.at + (r.at ?? 0), index };
    values_si.push(r.value_si);
    const same = itemSpec.unit === spec.unit;
    values.push(same ? r.value : fieldUnit ? fromSI(r.value_si, fieldUnit) : r.value_si);
  }
  return { ok: true, values, values_si };
}
