"use client";
// A document without blocks (new, or everything deleted): editors can start from the template.
import { useState } from "react";
import { POWERTRAIN_LABELS, POWERTRAINS, createScenarioDoc, type PowertrainKind } from "@/lib/notebook";
import { Button } from "@/components/ui/button";
import { useNotebook } from "./notebook-context";

export function EmptyDocument({ canEdit, powertrain, name }: { canEdit: boolean; powertrain: PowertrainKind | null; name: string }) {
  const { doc, step } = useNotebook();
  const [choice, setChoice] = useState<PowertrainKind>(powertrain ?? "conventional");
  return (
    <div className="mb-gutter rounded-card border border-dashed border-rule-strong px-gutter py-section text-center">
      <p className="font-medium">This document has no blocks.</p>
      {canEdit ? (
        <div className="mt-3 flex flex-wrap items-center justify-center gap-2">
          <select aria-label="Template powertrain" value={choice} onChange={(e) => setChoice(e.target.value as PowertrainKind)}
            className="rounded-control border border-rule-strong bg-paper-raised px-2 py-1.5 text-sm">
            {POWERTRAINS.map((p) => <option key={p} value={p}>{POWERTRAIN_LABELS[p]}</option>)}
          </select>
          <Button onClick={() => step(() => createScenarioDoc(choice, name || "Untitled scenario", doc))}>Start from the template</Button>
        </div>
      ) : <p className="mt-1 text-sm text-muted">An editor has not added any yet.</p>}
    </div>
  );
}
