// Library references in blocks: a drive cycle, an engine full-load curve or a battery OCV curve
// saved in the workspace library and named by id. compile stays pure and synchronous, so the
// caller loads the items first and passes a resolver; the kind check lives here, so the server
// and the browser give the same message for an id of the wrong kind.
import type { LibraryKind } from "@/lib/library/kinds";
import type { BlockKind } from "./block-kinds";
import { fieldLabel } from "./blocks";
import { setPath, type FieldContext } from "./compile-fields";
import { pathKey } from "./compile-types";
import type { BlockSnapshot } from "./model";

export type LibraryCycle = { dt_s: number; speed_kmh: number[]; grade_pct?: number[] };
export type LibraryFullLoad = { speed_rpm: number[]; torque_nm: number[] };
export type LibraryOcv = { soc: number[]; voltage_v: number[] };

/** One library item as a resolver hands it to compile. */
export type LibraryItemData =
  | { kind: "cycle"; name: string; data: LibraryCycle }
  | { kind: "engine_full_load"; name: string; data: LibraryFullLoad }
  | { kind: "battery_ocv"; name: string; data: LibraryOcv };

/** Looks up a library id (loaded beforehand); a string says why it cannot be used. */
export type LibraryResolver = (id: string) => LibraryItemData | string;

const KIND_PHRASE: Record<LibraryKind, string> = {
  cycle: "a drive cycle",
  engine_full_load: "an engine full-load curve",
  battery_ocv: "a battery OCV curve",
};

/** The item behind `id` if it is of `kind`, else why not (without the field label). */
export function resolveOfKind<K extends LibraryKind>(resolve: LibraryResolver, id: string, kind: K): Extract<LibraryItemData, { kind: K }> | string {
  const found = resolve(id);
  if (typeof found === "string") return found;
  if (found.kind !== kind) return `library item "${found.name}" is ${KIND_PHRASE[found.kind]}, not ${KIND_PHRASE[kind]}`;
  return found as Extract<LibraryItemData, { kind: K }>;
}

/** Component curves a block can take from the library instead of its list fields. */
const CURVES: Partial<Record<BlockKind, { field: string; kind: "engine_full_load" | "battery_ocv"; path: readonly string[]; what: string }>> = {
  engine: { field: "full_load_library_id", kind: "engine_full_load", path: ["engine", "max_torque_nm"], what: "full-load curve" },
  battery_pack: { field: "ocv_library_id", kind: "battery_ocv", path: ["battery", "ocv"], what: "OCV curve" },
};

/** Fills the block's curve from the library when its reference field has an id (after compileFields). */
export function compileLibraryCurve(block: BlockSnapshot, scenario: Record<string, unknown>, ctx: FieldContext, resolve?: LibraryResolver): void {
  const curve = CURVES[block.kind];
  if (!curve) return;
  const id = (block.params[curve.field] ?? "").trim();
  if (id === "") return;
  const key = pathKey(curve.path);
  ctx.sources.set(key, { blockId: block.id, kind: block.kind, field: curve.field });
  const fail = (text: string) => {
    ctx.messages.push({ blockId: block.id, field: curve.field, severity: "error", text: `${fieldLabel(block.kind, curve.field)}: ${text}` });
    ctx.failed.add(key);
  };
  if (!resolve) return fail(`library ${curve.what}s are not available here; choose "none" and enter the points`);
  const found = resolveOfKind(resolve, id, curve.kind);
  if (typeof found === "string") return fail(found);
  const d = found.data;
  setPath(scenario, curve.path, "speed_rpm" in d ? { speed_rpm: d.speed_rpm, torque_nm: d.torque_nm } : { soc: d.soc, voltage_v: d.voltage_v });
}
