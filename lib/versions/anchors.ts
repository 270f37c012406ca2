// Where a comment thread is attached: a whole block, one parameter of a block, or a ledger row.
import { SINK_KEYS, SUPPLY_KEYS, type LedgerKey } from "@/lib/engine";
import type { DocSnapshot } from "@/lib/notebook";

export const ANCHOR_KINDS = ["block", "parameter", "ledger_row"] as const;
export type AnchorKind = (typeof ANCHOR_KINDS)[number];

export interface Anchor {
  kind: AnchorKind;
  /** block id | "blockId/field" | ledger key */
  key: string;
}

const LEDGER_KEYS: readonly string[] = [...SUPPLY_KEYS, ...SINK_KEYS];

export function isLedgerKey(key: string): key is LedgerKey {
  return LEDGER_KEYS.includes(key);
}

export function parameterKey(blockId: string, field: string): string {
  return `${blockId}/${field}`;
}

export function splitParameterKey(key: string): { blockId: string; field: string } | null {
  const at = key.indexOf("/");
  if (at <= 0 || at === key.length - 1) return null;
  return { blockId: key.slice(0, at), field: key.slice(at + 1) };
}

/** A message naming what is wrong with an anchor, or null when its shape is right. */
export function anchorProblem(anchor: Anchor): string | null {
  if (anchor.kind === "ledger_row") return isLedgerKey(anchor.key) ? null : `anchor.key: "${anchor.key}" is not a ledger row (${LEDGER_KEYS.join(", ")})`;
  if (anchor.kind === "parameter") return splitParameterKey(anchor.key) ? null : `anchor.key: a parameter anchor is "blockId/field", got "${anchor.key}"`;
  return anchor.key.trim() === "" ? "anchor.key: the block id is empty" : null;
}

/**
 * Is the anchored thing still in `doc`? A thread whose block (or parameter) was deleted later
 * stays readable; the UI marks it detached instead of hiding it.
 */
export function isDetached(anchor: Anchor, doc: DocSnapshot): boolean {
  if (anchor.kind === "ledger_row") return false;
  if (anchor.kind === "block") return !doc.blocks.some((b) => b.id === anchor.key);
  const p = splitParameterKey(anchor.key);
  const block = p ? doc.blocks.find((b) => b.id === p.blockId) : undefined;
  return !block || !(p!.field in block.params);
}

/** "Body & road load › Test mass", "Loss ledger › Rolling resistance", or a detached note. */
export function anchorLabel(anchor: Anchor, doc: DocSnapshot, ledgerLabels: Record<string, string>, fieldLabel: (kind: string, key: string) => string): string {
  if (anchor.kind === "ledger_row") return `Loss ledger › ${ledgerLabels[anchor.key] ?? anchor.key}`;
  const blockId = anchor.kind === "block" ? anchor.key : splitParameterKey(anchor.key)?.blockId;
  const block = doc.blocks.find((b) => b.id === blockId);
  if (!block) return "a block that is no longer in the document";
  if (anchor.kind === "block") return block.title;
  const field = splitParameterKey(anchor.key)!.field;
  return `${block.title} › ${fieldLabel(block.kind, field)}`;
}
