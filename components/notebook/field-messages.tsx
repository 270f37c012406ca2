"use client";
// Compile messages under a field: the text, and for a formula parse error the field text with a
// caret at the character it names.
import type { CompileMessage } from "@/lib/notebook";

export function FieldMessages({ id, messages, text }: { id: string; messages: CompileMessage[]; text: string }) {
  if (messages.length === 0) return null;
  return (
    <ul id={id} className="mt-1 space-y-1 text-sm" role="alert">
      {messages.map((m, i) => (
        <li key={i} className={m.severity === "error" ? "text-danger" : "text-warn"}>
          <span>{capitalise(m.text)}</span>
          {m.at !== undefined ? <Caret text={text} at={m.at} /> : null}
        </li>
      ))}
    </ul>
  );
}

function Caret({ text, at }: { text: string; at: number }) {
  const pos = Math.max(0, Math.min(at, text.length));
  return (
    <span className="mt-0.5 block font-mono text-xs text-ink-soft">
      <span className="text-muted">at character {pos + 1}: </span>
      <span>{text.slice(0, pos)}</span>
      <mark className="rounded-sm bg-danger-soft px-px text-danger">{text.slice(pos, pos + 1) || "\u2002"}</mark>
      <span>{text.slice(pos + 1)}</span>
    </span>
  );
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
