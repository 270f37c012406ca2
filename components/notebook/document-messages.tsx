"use client";
// Messages that belong to no single block ("the series hybrid needs a generator set block") and
// findings about components the document has no block for.
import type { Finding } from "@/lib/engine";
import type { CompileMessage } from "@/lib/notebook";
import { FindingsList } from "./findings-list";

export function DocumentMessages({ messages, findings }: { messages: CompileMessage[]; findings: Finding[] }) {
  if (messages.length === 0 && findings.length === 0) return null;
  return (
    <section aria-label="Document messages" className="mb-gutter">
      <FindingsList messages={messages} findings={findings} />
    </section>
  );
}
