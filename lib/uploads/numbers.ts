export type DecimalMark = "." | ",";

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;
const NOT_FINITE = /^[+-]?(nan|inf|infinity|#n\/a|#num!|#div\/0!|null|undefined)$/i;

export type CellValue = { ok: true; value: number } | { ok: false; message: string };

/** Reads one numeric cell; messages quote the cell as written. */
export function readNumber(cell: string, decimal: DecimalMark): CellValue {
  const text = cell.trim();
  if (text === "") return { ok: false, message: "empty cell; a number is needed" };
  if (NOT_FINITE.test(text)) return { ok: false, message: `"${text}" is not a finite number` };
  if (decimal === "." && PLAIN.test(text)) return finite(Number(text), text);
  if (decimal === "," && COMMA.test(text)) return finite(Number(text.replace(",", ".")), text);
  if (decimal === "." && /^[+-]?\d+,\d+$/.test(text))
    return { ok: false, message: `"${text}" has a decimal comma; choose the decimal comma for this file` };
  return { ok: false, message: `"${text}" is not a number` };
}

function finite(value: number, text: string): CellValue {
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `"${text}" is not a finite number` };
}

/** True when the cell reads as a number with either decimal mark (used for header detection). */
export function looksNumeric(cell: string): boolean {
  const t = cell.trim();
  return PLAIN.test(t) || COMMA.test(t) || NOT_FINITE.test(t);
}

/** A decimal comma is proposed when the delimiter is not a comma and some cells use one. */
export function detectDecimal(cells: readonly string[]): DecimalMark {
  return cells.some((c) => /^[+-]?\d*,\d+$/.test(c.trim())) ? "," : ".";
}

/** Shortest readable form of a number for messages: up to 6 significant digits. */
export function fmt(x: number): string {
  return String(Number(x.toPrecision(6)));
}
