// Block-by-block comparison of two notebook snapshots. Blocks are matched by their stable id,
// so a renamed or moved block is the same block; a deleted and re-added one is not.
import { FIELDS, fieldOf, type BlockSnapshot } from "@/lib/notebook";
import { movedIds } from "./lcs";
import type { BlockDiff, ParamChange, ParamSide } from "./types";
import type { EvaluatedDoc } from "./values";

function sameValue(a: ParamSide | null, b: ParamSide | null): boolean {
  return JSON.stringify(a?.value?.value ?? null) === JSON.stringify(b?.value?.value ?? null) && a?.value?.unit === b?.value?.unit;
}

/** Field keys in catalogue order, then any other keys in first-seen order. */
function keyOrder(a: BlockSnapshot | undefined, b: BlockSnapshot | undefined): string[] {
  const kind = (b ?? a)!.kind;
  const keys: string[] = FIELDS[kind].map((f) => f.key);
  for (const k of [...Object.keys(a?.params ?? {}), ...Object.keys(b?.params ?? {})]) if (!keys.includes(k)) keys.push(k);
  return keys.filter((k) => (a && k in a.params) || (b && k in b.params));
}

function delta(from: ParamSide | null, to: ParamSide | null): number | null {
  const f = from?.value;
  const t = to?.value;
  if (!f || !t || typeof f.value !== "number" || typeof t.value !== "number" || f.unit !== t.unit) return null;
  return t.value - f.value;
}

export function paramChanges(id: string, a: EvaluatedDoc, b: EvaluatedDoc): ParamChange[] {
  const blockA = a.doc.blocks.find((x) => x.id === id);
  const blockB = b.doc.blocks.find((x) => x.id === id);
  const kind = (blockB ?? blockA)!.kind;
  const out: ParamChange[] = [];
  for (const key of keyOrder(blockA, blockB)) {
    const from = blockA ? a.side(id, key) : null;
    const to = blockB ? b.side(id, key) : null;
    const label = fieldOf(kind, key)?.label ?? key;
    let change: ParamChange["change"] | null = null;
    if (!from && to) change = "added";
    else if (from && !to) change = "removed";
    else if (from && to && from.text.trim() !== to.text.trim()) change = "changed";
    else if (from && to && !sameValue(from, to)) change = "value";
    if (change) out.push({ key, label, change, from, to, delta: delta(from, to) });
  }
  return out;
}

function blockDiff(id: string, a: EvaluatedDoc, b: EvaluatedDoc, moved: Set<string>): BlockDiff {
  const iA = a.doc.blocks.findIndex((x) => x.id === id);
  const iB = b.doc.blocks.findIndex((x) => x.id === id);
  const blockA = a.doc.blocks[iA];
  const blockB = b.doc.blocks[iB];
  const params = paramChanges(id, a, b);
  const renamed = blockA && blockB && blockA.title !== blockB.title ? { from: blockA.title, to: blockB.title } : null;
  const note = blockA && blockB && blockA.note !== blockB.note ? { from: blockA.note, to: blockB.note } : null;
  const status = !blockA ? "added" : !blockB ? "removed" : params.length > 0 || renamed || note ? "changed" : "unchanged";
  return {
    id, kind: (blockB ?? blockA)!.kind, title: (blockB ?? blockA)!.title, status, moved: moved.has(id),
    fromIndex: iA < 0 ? null : iA, toIndex: iB < 0 ? null : iB, renamed, params, note,
  };
}

/**
 * Every block of A and B once, in B's order; a removed block appears after the block that
 * preceded it in A (or first), so the list reads like the document with the gaps shown.
 */
export function diffBlocks(a: EvaluatedDoc, b: EvaluatedDoc): BlockDiff[] {
  const idsA = a.doc.blocks.map((x) => x.id);
  const idsB = b.doc.blocks.map((x) => x.id);
  const moved = movedIds(idsA, idsB);
  const inB = new Set(idsB);
  const order = [...idsB];
  idsA.forEach((id, i) => {
    if (inB.has(id)) return;
    const before = idsA.slice(0, i).reverse().find((x) => order.includes(x));
    order.splice(before === undefined ? 0 : order.indexOf(before) + 1, 0, id);
  });
  return order.map((id) => blockDiff(id, a, b, moved));
}
