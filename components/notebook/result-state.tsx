"use client";
// Shared frame of the result views: nothing yet, errors (with the last good result shown
// dimmed and marked), or the current result.
import type { ReactNode } from "react";
import type { Result } from "@/lib/engine";
import { useEvaluationState } from "./notebook-context";

export function WithResult({ children }: { children: (result: Result) => ReactNode }) {
  const evaluation = useEvaluationState();
  const errors = evaluation.messages.filter((m) => m.severity === "error").length;
  if (!evaluation.result) {
    return (
      <p className="rounded-control border border-dashed border-rule-strong px-4 py-6 text-center text-sm text-muted">
        {evaluation.pending ? "Calculating…" : errors > 0 ? `No result yet: the document has ${errors} error${errors === 1 ? "" : "s"} (see the fields marked in red).` : "No result yet."}
      </p>
    );
  }
  return (
    <div aria-busy={evaluation.pending || undefined}>
      {evaluation.stale ? (
        <p className="mb-3 rounded-control bg-warn-soft px-3 py-2 text-sm text-warn" role="status">
          Showing the last valid result: the document now has {errors} error{errors === 1 ? "" : "s"}.
        </p>
      ) : null}
      <div className={evaluation.stale ? "opacity-60" : undefined}>{children(evaluation.result)}</div>
    </div>
  );
}

export function Cautions() {
  return (
    <p className="text-xs leading-relaxed text-muted" data-cautions>
      These are concept-stage estimates on a quasi-static model, not type-approval or certification figures.
      Battery current, voltage and temperature limits come from the cell maker&apos;s data and the applicable
      safety standards and local regulations, not from this tool.
    </p>
  );
}
