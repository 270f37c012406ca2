import type { BlockKind } from "./block-kinds";

export interface CompileMessage {
  blockId?: string;
  /** field key, or parameter name in a Parameters block */
  field?: string;
  severity: "error" | "warning";
  text: string;
  /** character index in the field's text */
  at?: number;
}

/** Where a Scenario value came from: "battery.capacity_ah" → block and field. */
export interface Source {
  blockId: string;
  kind: BlockKind;
  field?: string;
}

export type SourceTable = Map<string, Source>;

/** Scenario paths written as dotted names without list indices: "engine.max_torque_nm.speed_rpm". */
export function pathKey(path: readonly (string | number)[] | string): string {
  const text = typeof path === "string" ? path : path.join(".");
  return text.replace(/\[\d+\]/g, "").replace(/\.\d+(?=\.|$)/g, "");
}
