// The result views every demo document shows right after its loss ledger: the energy flow, and
// for a powertrain with an engine the engine's operating points. The car templates carry only
// some of them, and in other places; the demo's order is the reading order of a review: where
// the energy went (ledger, flow), then where the engine ran, then the traces.
import type * as Y from "yjs";
import type { BlockKind, PowertrainKind } from "@/lib/notebook/block-kinds";
import { insertBlock, readBlocks, removeBlock } from "@/lib/notebook/model";

export function demoResultViews(powertrain: PowertrainKind): BlockKind[] {
  return powertrain === "bev" ? ["energy_flow"] : ["energy_flow", "operating_points"];
}

/** Puts the demo's result views right after the loss ledger (moving any the template placed elsewhere); returns `doc`. */
export function withResultViews(doc: Y.Doc, powertrain: PowertrainKind): Y.Doc {
  const views = demoResultViews(powertrain);
  doc.transact(() => {
    for (const b of readBlocks(doc)) if (views.includes(b.kind)) removeBlock(doc, b.id);
    const ledger = readBlocks(doc).findIndex((b) => b.kind === "loss_ledger");
    if (ledger < 0) throw new Error("demo document without a loss ledger: the result views have no place");
    views.forEach((kind, i) => insertBlock(doc, kind, ledger + 1 + i));
  });
  return doc;
}
