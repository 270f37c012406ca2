// Evaluated values of one document, per block and field, as a reader of a diff wants them:
// the number in a unit next to the text that produced it.
import {
  compile, fieldActive, fieldOf, findUnit, fromSI, QUANTITIES, type CompileResult, type DocSnapshot, type Dimension,
} from "@/lib/notebook";
import { UNITS } from "@/lib/notebook/unit-table";
import type { ParamSide, ShownValue } from "./types";

export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return "—";
  const abs = Math.abs(x);
  const s = abs !== 0 && (abs >= 1e7 || abs < 1e-4) ? x.toExponential(4) : String(Number(x.toPrecision(6)));
  return s.replace(/^-/, "−");
}

export function showValue(value: number | number[] | string, unit: string): ShownValue {
  const body = typeof value === "string" ? value : Array.isArray(value) ? value.map(formatNumber).join(", ") : formatNumber(value);
  return { value, unit, text: unit && typeof value !== "string" ? `${body} ${unit}` : body };
}

function sameDim(a: Dimension, b: Dimension): boolean {
  return a.every((e, i) => Math.abs(e - b[i]!) < 1e-12);
}

/** The SI unit symbol of a dimension ("kg", "W"), or "" for a pure number or an unnamed one. */
export function siSymbol(dim: Dimension): string {
  const u = UNITS.find((x) => x.symbol !== "" && x.to_si === 1 && x.per === undefined && sameDim(QUANTITIES[x.quantity].dim, dim));
  return u?.symbol ?? "";
}

/** Evaluates every field of every block of a snapshot (compile is pure, no engine run). */
export class EvaluatedDoc {
  readonly compiled: CompileResult;
  private readonly errors = new Map<string, string>();

  constructor(readonly doc: DocSnapshot) {
    this.compiled = compile(doc);
    for (const m of this.compiled.messages) {
      if (m.blockId && m.field && m.severity === "error") this.errors.set(`${m.blockId}\u0000${m.field}`, m.text);
    }
  }

  side(blockId: string, key: string): ParamSide | null {
    const block = this.doc.blocks.find((b) => b.id === blockId);
    if (!block || !(key in block.params)) return null;
    const text = block.params[key]!;
    const error = this.errors.get(`${blockId}\u0000${key}`);
    return { text, value: this.value(blockId, key), ...(error ? { error } : {}) };
  }

  private value(blockId: string, key: string): ShownValue | null {
    const block = this.doc.blocks.find((b) => b.id === blockId)!;
    if (block.kind === "parameters") {
      const r = this.compiled.parameters.get(key);
      if (!r || !r.ok) return null;
      const unit = r.unit ? findUnit(r.unit) : undefined;
      if (unit) return showValue(fromSI(r.value_si, unit), unit.symbol);
      return showValue(r.value_si, siSymbol(r.dim));
    }
    const field = fieldOf(block.kind, key);
    if (!field || !fieldActive(field, block.params, block.kind)) return null;
    const v = this.compiled.values.get(blockId)?.[key];
    if (v === undefined) return null;
    const unit = field.type === "number" || field.type === "list" ? field.unit : "";
    return showValue(v as number | number[] | string, unit);
  }
}
