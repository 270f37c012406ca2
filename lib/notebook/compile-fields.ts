import { BLOCK_TITLES } from "./block-kinds";
import { fieldActive, fieldLabel, FIELDS, type FieldDef } from "./blocks";
import type { CompileMessage, SourceTable } from "./compile-types";
import { pathKey } from "./compile-types";
import type { Environment } from "./expressions";
import { evaluateValue } from "./expressions";
import { parseList } from "./lists";
import type { BlockSnapshot } from "./model";

/** Writes `value` at `path` inside `target`, creating objects on the way. */
export function setPath(target: Record<string, unknown>, path: readonly string[], value: unknown): void {
  let cur = target;
  for (const part of path.slice(0, -1)) {
    if (typeof cur[part] !== "object" || cur[part] === null) cur[part] = {};
    cur = cur[part] as Record<string, unknown>;
  }
  cur[path[path.length - 1]] = value;
}

export interface FieldContext {
  env: Environment;
  messages: CompileMessage[];
  sources: SourceTable;
  /** scenario paths whose field failed, so engine errors about them are not repeated */
  failed: Set<string>;
  /** evaluated values in the Scenario's unit, per block and field (for display beside the text) */
  values: Map<string, Record<string, unknown>>;
}

export type FieldOutcome = { ok: true; value: string | number | number[] } | { ok: false; message: string; at?: number };

/**
 * One field's text → its Scenario value (number in the field's unit, list, or choice), or a
 * message with the character position. The UI can call it to preview a value while typing.
 */
export function evaluateField(f: FieldDef, text: string, env: Environment): FieldOutcome {
  switch (f.type) {
    case "choice": {
      const v = text.trim();
      if (!f.options.some((o) => o.value === v)) return { ok: false, message: `"${v}" is not one of ${f.options.map((o) => o.value).join(", ")}` };
      return { ok: true, value: v };
    }
    case "number": {
      const r = evaluateValue(text, { quantity: f.quantity, unit: f.unit, integer: f.integer }, env);
      return r.ok ? { ok: true, value: r.value } : r;
    }
    case "list": {
      const r = parseList(text, { quantity: f.quantity, unit: f.unit }, env);
      return r.ok ? { ok: true, value: r.values } : { ok: false, message: r.message, at: r.at };
    }
    case "text":
      return { ok: true, value: text.trim() };
  }
}

function fieldValue(f: FieldDef, text: string, block: BlockSnapshot, ctx: FieldContext): FieldOutcome {
  const r = evaluateField(f, text, ctx.env);
  if (!r.ok) ctx.messages.push({ blockId: block.id, field: f.key, severity: "error", text: `${fieldLabel(block.kind, f.key)}: ${r.message}`, at: r.at });
  return r;
}

/**
 * Compiles the active catalogue fields of one block into `target` (the scenario object).
 * Empty optional fields are left out (the engine applies its defaults).
 */
export function compileFields(block: BlockSnapshot, target: Record<string, unknown>, ctx: FieldContext, skip: readonly string[] = []): void {
  for (const f of FIELDS[block.kind]) {
    if (skip.includes(f.key) || !fieldActive(f, block.params, block.kind)) continue;
    const text = block.params[f.key] ?? "";
    const path = "path" in f ? f.path : undefined;
    if (text.trim() === "") {
      if (!f.optional && f.type !== "text") {
        ctx.messages.push({ blockId: block.id, field: f.key, severity: "error", text: `${fieldLabel(block.kind, f.key)}: is empty`, at: 0 });
        if (path) ctx.failed.add(pathKey(path));
      }
      continue;
    }
    if (!path) continue;
    ctx.sources.set(pathKey(path), { blockId: block.id, kind: block.kind, field: f.key });
    const r = fieldValue(f, text, block, ctx);
    if (r.ok) {
      setPath(target, path, r.value);
      const mine = ctx.values.get(block.id) ?? {};
      mine[f.key] = r.value;
      ctx.values.set(block.id, mine);
    } else ctx.failed.add(pathKey(path));
  }
  warnUnknownFields(block, ctx.messages);
}

function warnUnknownFields(block: BlockSnapshot, messages: CompileMessage[]): void {
  const known = new Set(FIELDS[block.kind].map((f) => f.key));
  for (const key of Object.keys(block.params)) {
    if (!known.has(key)) {
      messages.push({ blockId: block.id, field: key, severity: "warning", text: `${BLOCK_TITLES[block.kind]}: unknown field "${key}" is ignored` });
    }
  }
}
