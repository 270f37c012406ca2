"use client";
// Findings of the engine (infeasible steps, sanity warnings) and block-level compile messages,
// shown inside the block they concern.
import type { Finding } from "@/lib/engine";
import type { CompileMessage } from "@/lib/notebook";

export function FindingsList({ findings, messages }: { findings: Finding[]; messages: CompileMessage[] }) {
  if (findings.length === 0 && messages.length === 0) return null;
  return (
    <ul className="mt-3 space-y-1.5" aria-label="Findings for this block">
      {messages.map((m, i) => (
        <li key={`m${i}`} className={`rounded-control px-3 py-2 text-sm ${m.severity === "error" ? "bg-danger-soft text-danger" : "bg-warn-soft text-warn"}`}>
          {m.text.charAt(0).toUpperCase() + m.text.slice(1)}
        </li>
      ))}
      {findings.map((f, i) => (
        <li key={`f${i}`} className={`rounded-control px-3 py-2 text-sm ${f.severity === "infeasible" ? "bg-danger-soft text-danger" : "bg-warn-soft text-warn"}`} data-finding={f.code}>
          <span className="font-semibold">{f.severity === "infeasible" ? "Infeasible" : "Check"}:</span> {f.message}
        </li>
      ))}
    </ul>
  );
}
