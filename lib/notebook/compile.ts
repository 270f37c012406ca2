import {
  BLOCK_TITLES, COMPONENT_KINDS, POWERTRAIN_LABELS, POWERTRAINS, REQUIRED_KINDS, STRATEGY_KINDS,
  type BlockKind, type PowertrainKind,
} from "./block-kinds";
import { fieldLabel } from "./blocks";
import { compileFields, type FieldContext } from "./compile-fields";
import { compileLibraryCurve, resolveOfKind, type LibraryResolver } from "./compile-library";
import type { CompileMessage, SourceTable } from "./compile-types";
import { SECTION_KIND, validateWithEngine } from "./compile-validate";
import type * as Y from "yjs";
import { readDoc, type BlockSnapshot } from "./model";
import { evaluateParameters, type ParameterResult } from "./parameters";

export type { CompileMessage, Source, SourceTable } from "./compile-types";

export const SCENARIO_FORMAT = "joulebook.scenario/1";

export type { LibraryCycle, LibraryFullLoad, LibraryItemData, LibraryOcv, LibraryResolver } from "./compile-library";

export interface CompileInput {
  name: string;
  powertrain: PowertrainKind | null;
  blocks: readonly BlockSnapshot[];
  /** Optional: without it a block that names a library item (cycle, full-load or OCV curve) is an error. */
  resolveLibrary?: LibraryResolver;
}

export interface CompileResult {
  /** present only when there is no error; validated by the engine's parseScenario (defaults filled) */
  scenario?: Record<string, unknown>;
  messages: CompileMessage[];
  /** scenario path (dotted, no indices) → block and field that wrote it */
  sources: SourceTable;
  /** every parameter's outcome, by name (for showing values next to the Parameters block) */
  parameters: Map<string, ParameterResult>;
  /** blockId → field key → compiled value in the Scenario's unit (number, number[] or choice) */
  values: Map<string, Record<string, unknown>>;
}

const SECTION_OF: Partial<Record<BlockKind, string>> = Object.fromEntries(
  Object.entries(SECTION_KIND).map(([section, kind]) => [kind, section]),
);

const article = (word: string) => (/^[aeiou]/i.test(word) ? "an" : "a");

function needsMessage(pt: PowertrainKind, kind: BlockKind): string {
  const what = BLOCK_TITLES[kind].toLowerCase();
  return `the ${POWERTRAIN_LABELS[pt]} needs ${article(what)} ${what} block`;
}

/** First block of each component kind; later ones are errors (one per scenario). */
function pickComponents(blocks: readonly BlockSnapshot[], messages: CompileMessage[]): Map<BlockKind, BlockSnapshot> {
  const chosen = new Map<BlockKind, BlockSnapshot>();
  for (const b of blocks) {
    if (!COMPONENT_KINDS.includes(b.kind)) continue;
    const first = chosen.get(b.kind);
    if (first) {
      messages.push({
        blockId: b.id, severity: "error",
        text: `a second ${BLOCK_TITLES[b.kind]} block ("${b.title}"): a scenario has one; remove it or merge it into "${first.title}"`,
      });
    } else chosen.set(b.kind, b);
  }
  return chosen;
}

function compileParameters(blocks: readonly BlockSnapshot[], messages: CompileMessage[]) {
  const defs = blocks.filter((b) => b.kind === "parameters")
    .flatMap((b) => Object.entries(b.params).map(([name, text]) => ({ name, text, blockId: b.id })));
  const set = evaluateParameters(defs);
  const reported = new Set<string>();
  for (const d of defs) {
    const r = set.results.get(d.name);
    if (!r || r.ok) continue;
    // a name defined twice: report on each definition after the first
    const twice = defs.filter((x) => x.name === d.name).length > 1;
    if (reported.has(d.name) && !twice) continue;
    reported.add(d.name);
    messages.push({ blockId: d.blockId, field: d.name, severity: "error", text: `Parameters › ${d.name}: ${r.message}`, at: r.at });
  }
  return set;
}

function compileCycle(block: BlockSnapshot, scenario: Record<string, unknown>, ctx: FieldContext, resolve?: LibraryResolver): void {
  const source = (block.params.source ?? "standard").trim() || "standard";
  const err = (field: string, text: string) => {
    ctx.messages.push({ blockId: block.id, field, severity: "error", text: `${fieldLabel("drive_cycle", field)}: ${text}` });
    ctx.failed.add("cycle");
  };
  if (source === "library" && resolve) return compileLibraryCycle(block, scenario, ctx, resolve, err);
  if (source === "library") return err("library_id", "cycles from the library are not available yet; choose a standard cycle or your own samples");
  if (source !== "standard" && source !== "custom") return err("source", `"${source}" is not one of standard, custom, library`);
  if (source === "custom" && (block.params.dt ?? "").trim() === "") return err("dt", "is empty (own speed samples need their time step)");
  scenario.cycle = {};
  compileFields(block, scenario, ctx, ["source", "library_id"]);
}

function compileLibraryCycle(block: BlockSnapshot, scenario: Record<string, unknown>, ctx: FieldContext, resolve: LibraryResolver,
  err: (field: string, text: string) => void): void {
  const id = (block.params.library_id ?? "").trim();
  if (id === "") return err("library_id", "is empty; choose a cycle from the workspace library");
  const item = resolveOfKind(resolve, id, "cycle");
  if (typeof item === "string") return err("library_id", item);
  const found = item.data;
  scenario.cycle = found.grade_pct ? { dt_s: found.dt_s, speed_kmh: found.speed_kmh, grade_pct: found.grade_pct } : { dt_s: found.dt_s, speed_kmh: found.speed_kmh };
  ctx.sources.set("cycle", { blockId: block.id, kind: "drive_cycle", field: "library_id" });
}

export function compile(input: CompileInput): CompileResult {
  const messages: CompileMessage[] = [];
  const sources: SourceTable = new Map();
  const failed = new Set<string>();
  const values = new Map<string, Record<string, unknown>>();
  const params = compileParameters(input.blocks, messages);
  const pt = input.powertrain;
  if (!pt || !POWERTRAINS.includes(pt)) {
    messages.push({ severity: "error", text: `choose a powertrain (${POWERTRAINS.join(", ")})` });
    return { messages, sources, parameters: params.results, values };
  }
  const chosen = pickComponents(input.blocks, messages);
  for (const kind of REQUIRED_KINDS[pt]) {
    if (!chosen.has(kind)) {
      messages.push({ severity: "error", text: needsMessage(pt, kind) });
      failed.add(SECTION_OF[kind]!);
    }
  }
  const scenario: Record<string, unknown> = { format: SCENARIO_FORMAT, name: input.name.trim() || "Untitled scenario", powertrain: pt };
  const ctx: FieldContext = { env: params.env, messages, sources, failed, values };
  for (const [kind, block] of chosen) {
    if (!REQUIRED_KINDS[pt].includes(kind)) {
      messages.push({ blockId: block.id, severity: "warning", text: `${BLOCK_TITLES[kind]}: not used by the ${POWERTRAIN_LABELS[pt]}` });
      continue;
    }
    if (kind === "drive_cycle") compileCycle(block, scenario, ctx, input.resolveLibrary);
    else compileSection(kind, block, scenario, ctx, pt, input.resolveLibrary);
  }
  const blockOfKind = new Map([...chosen].map(([k, b]) => [k, b.id]));
  const checked = validateWithEngine(scenario, sources, blockOfKind, failed);
  if (!checked.ok) messages.push(...checked.messages);
  const hasError = messages.some((m) => m.severity === "error");
  return { scenario: hasError || !checked.ok ? undefined : checked.scenario, messages, sources, parameters: params.results, values };
}

/** compile(readDoc(doc)) */
export function compileDoc(doc: Y.Doc): CompileResult {
  return compile(readDoc(doc));
}

function compileSection(kind: BlockKind, block: BlockSnapshot, scenario: Record<string, unknown>, ctx: FieldContext, pt: PowertrainKind,
  resolve?: LibraryResolver): void {
  const section = SECTION_OF[kind]!;
  scenario[section] = {};
  if (kind === "energy_manager") {
    const strategy = (block.params.kind ?? "").trim();
    if (!STRATEGY_KINDS[pt].includes(strategy)) {
      ctx.messages.push({
        blockId: block.id, field: "kind", severity: "error",
        text: `${fieldLabel(kind, "kind")}: the ${POWERTRAIN_LABELS[pt]} supports ${STRATEGY_KINDS[pt].join(", ")}; got "${strategy}"`,
      });
      ctx.failed.add("strategy");
      return;
    }
  }
  compileFields(block, scenario, ctx);
  compileLibraryCurve(block, scenario, ctx, resolve);
}
