import { parseScenario } from "@/lib/engine/scenario";
import { BLOCK_TITLES, type BlockKind } from "./block-kinds";
import { fieldLabel } from "./blocks";
import { pathKey, type CompileMessage, type Source, type SourceTable } from "./compile-types";

/** Scenario top-level keys and the block kind that produces them. */
export const SECTION_KIND: Record<string, BlockKind> = {
  cycle: "drive_cycle", vehicle: "body", driveline: "driveline", engine: "engine", motor: "electric_machine",
  generator: "generator_set", battery: "battery_pack", strategy: "energy_manager",
};

function showValue(v: unknown): string {
  const text = JSON.stringify(v);
  if (text === undefined) return "nothing";
  return text.length > 60 ? `${text.slice(0, 57)}…` : text;
}

/** The source of the longest known prefix of a path, else the block of its section. */
function sourceOf(path: string, sources: SourceTable, blockOfKind: ReadonlyMap<BlockKind, string>): Source | undefined {
  const parts = pathKey(path).split(".");
  for (let n = parts.length; n > 0; n--) {
    const hit = sources.get(parts.slice(0, n).join("."));
    if (hit) return hit;
  }
  const kind = SECTION_KIND[parts[0]];
  const blockId = kind ? blockOfKind.get(kind) : undefined;
  return kind && blockId ? { blockId, kind } : undefined;
}

function overlaps(path: string, failed: ReadonlySet<string>): boolean {
  const key = pathKey(path);
  for (const f of failed) if (key === f || key.startsWith(`${f}.`) || f.startsWith(`${key}.`)) return true;
  return false;
}

export type Validated = { ok: true; scenario: Record<string, unknown> } | { ok: false; messages: CompileMessage[] };

/**
 * Runs the engine's own schema and rules (lib/engine/scenario) on the compiled object and
 * maps every error path back to the block and field that wrote it. Errors on paths whose
 * field already failed in compile are dropped, so one mistake gives one message.
 */
export function validateWithEngine(
  scenario: Record<string, unknown>, sources: SourceTable, blockOfKind: ReadonlyMap<BlockKind, string>, failed: ReadonlySet<string>,
): Validated {
  const r = parseScenario(scenario);
  if (r.ok) return { ok: true, scenario: r.scenario as unknown as Record<string, unknown> };
  const messages: CompileMessage[] = [];
  for (const e of r.errors) {
    if (overlaps(e.path, failed)) continue;
    const src = sourceOf(e.path, sources, blockOfKind);
    const where = src ? (src.field ? fieldLabel(src.kind, src.field) : BLOCK_TITLES[src.kind]) : e.path;
    messages.push({
      blockId: src?.blockId, field: src?.field, severity: "error",
      text: `${where}: ${e.rule} (got ${showValue(e.value)}; scenario field ${e.path})`,
    });
  }
  return { ok: false, messages };
}
