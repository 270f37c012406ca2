"use client";
// All findings of the result under the headline figures, each with a link to the block it
// concerns (scrolls there and moves the focus).
import { BLOCK_TITLES } from "@/lib/notebook";
import type { Result } from "@/lib/engine";
import { blockKindOfFinding } from "@/lib/client/notebook/findings";
import { useNotebook } from "./notebook-context";
import { jumpToBlock } from "./jump";

export function FindingsSummary({ result }: { result: Result }) {
  const { blocks } = useNotebook();
  if (result.findings.length === 0) return <p className="mt-3 text-sm text-ok">No findings: every step within limits, no warnings.</p>;
  return (
    <div className="mt-3">
      <p className="text-xs font-semibold uppercase tracking-wide text-muted">Findings ({result.findings.length})</p>
      <ul className="mt-1 space-y-1">
        {result.findings.map((f, i) => {
          const kind = blockKindOfFinding(f);
          const block = kind ? blocks.find((b) => b.kind === kind) : undefined;
          return (
            <li key={i} className="flex flex-wrap items-baseline gap-x-2 text-sm">
              <span className={`size-2 shrink-0 translate-y-[-1px] rounded-full ${f.severity === "infeasible" ? "bg-danger" : "bg-warn"}`} aria-hidden="true" />
              <span className="min-w-0 flex-1">{f.message}</span>
              {block ? (
                <button type="button" onClick={() => jumpToBlock(block.id)} className="text-xs font-medium text-electric underline underline-offset-2" data-jump={block.id}>
                  go to {BLOCK_TITLES[block.kind]}
                </button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
