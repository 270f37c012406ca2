// A version's snapshot and summary → what the read-only view shows (runs on the server).
import { SINK_KEYS, SUPPLY_KEYS } from "@/lib/engine/ledger";
import { fieldOf, FIELDS, type DocSnapshot } from "@/lib/notebook";
import { LEDGER_LABELS } from "@/lib/versions/labels";
import type { ResultSummary } from "@/lib/versions/types";
import { EvaluatedDoc } from "@/lib/versions/values";
import type { ViewBlock, ViewLedgerRow } from "./version-view";

export function viewBlocks(doc: DocSnapshot): ViewBlock[] {
  const ev = new EvaluatedDoc(doc);
  return doc.blocks.map((b) => {
    const catalogue = FIELDS[b.kind].map((f) => f.key);
    const keys = [...catalogue.filter((k) => k in b.params), ...Object.keys(b.params).filter((k) => !catalogue.includes(k))];
    return {
      id: b.id, kind: b.kind, title: b.title, note: b.note,
      params: keys.map((key) => {
        const side = ev.side(b.id, key)!;
        return { key, label: fieldOf(b.kind, key)?.label ?? key, text: side.text, value: side.value?.text ?? null, ...(side.error ? { error: side.error } : {}) };
      }),
    };
  });
}

export function viewLedger(summary: ResultSummary | null): ViewLedgerRow[] {
  if (!summary) return [];
  return [
    ...SUPPLY_KEYS.map((key) => ({ key, label: LEDGER_LABELS[key], side: "supply" as const, j: summary.ledger_j[key] })),
    ...SINK_KEYS.map((key) => ({ key, label: LEDGER_LABELS[key], side: "sink" as const, j: summary.ledger_j[key] })),
  ];
}
