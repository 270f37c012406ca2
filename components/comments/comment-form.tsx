"use client";
// A textarea for a comment or reply; shows how to mention members and format text.
import { useId, useState } from "react";
import { ApiError } from "@/lib/client/api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { useThreads } from "./threads-context";

export function CommentForm({ label, submitLabel, onSubmit, onCancel }: { label: string; submitLabel: string; onSubmit(body: string): Promise<void>; onCancel?(): void }) {
  const id = useId();
  const { members } = useThreads();
  const [body, setBody] = useState("");
  const [error, setError] = useState<string>();
  const [busy, setBusy] = useState(false);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    setError(undefined);
    try {
      await onSubmit(body);
      setBody("");
    } catch (err) {
      setError(err instanceof ApiError ? (Object.values(err.fields)[0] ?? err.message) : "Something went wrong. Try again.");
    } finally {
      setBusy(false);
    }
  };
  const mentionAt = body.match(/(?:^|\s)@([\w.+-]*)$/)?.[1];
  const suggestions = mentionAt !== undefined ? members.filter((m) => m.handle.startsWith(mentionAt.toLowerCase()) || m.name.toLowerCase().includes(mentionAt.toLowerCase())).slice(0, 5) : [];
  return (
    <form onSubmit={submit} className="flex flex-col gap-2" noValidate>
      <FormMessage error={error} />
      <label htmlFor={id} className="text-sm font-medium">{label}</label>
      <textarea
        id={id} value={body} rows={3} maxLength={4000} onChange={(e) => setBody(e.target.value)}
        className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 text-sm"
        aria-describedby={`${id}-hint`}
      />
      {suggestions.length > 0 ? (
        <ul className="flex flex-wrap gap-1" aria-label="Mention a member">
          {suggestions.map((m) => (
            <li key={m.handle}>
              <button type="button" className="rounded-full bg-electric-soft px-2 py-0.5 text-xs text-electric"
                onClick={() => setBody((b) => b.replace(/@([\w.+-]*)$/, `@${m.handle} `))}>
                @{m.handle} · {m.name}
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      <p id={`${id}-hint`} className="text-xs text-muted">**bold**, _italic_, `code`, [text](https://…); @name mentions a member and e-mails them.</p>
      <div className="flex gap-2">
        <Button type="submit" disabled={busy || body.trim() === ""}>{busy ? "Sending…" : submitLabel}</Button>
        {onCancel ? <Button variant="ghost" onClick={onCancel}>Cancel</Button> : null}
      </div>
    </form>
  );
}
