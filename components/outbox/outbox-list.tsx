"use client";
import { useQuery } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/client/api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { Linkified } from "./linkify";

type OutboxMessage = { id: string; to: string; subject: string; text: string; html: string | null; receivedAt: string };


export function OutboxList() {
  const outbox = useQuery({
    queryKey: ["dev", "outbox"],
    queryFn: () => api<{ messages: OutboxMessage[] }>("/api/dev/outbox"),
    staleTime: 0,
  });
  return (
    <div className="flex flex-col gap-gutter">
      <div className="flex items-center gap-3">
        <Button variant="secondary" onClick={() => outbox.refetch()} disabled={outbox.isFetching}>
          {outbox.isFetching ? "Checking…" : "Check for new mail"}
        </Button>
        {outbox.data ? (
          <p className="text-sm text-muted" role="status">
            <span className="num">{outbox.data.messages.length}</span> {outbox.data.messages.length === 1 ? "message" : "messages"}
          </p>
        ) : null}
      </div>
      {outbox.isError ? (
        <FormMessage error={outbox.error instanceof ApiError ? outbox.error.message : "Could not read the outbox."} />
      ) : null}
      {outbox.data?.messages.length === 0 ? (
        <p className="rounded-control border border-dashed border-rule-strong px-gutter py-section text-center text-sm text-muted">
          No mail has been sent yet.
        </p>
      ) : null}
      <ol className="flex flex-col gap-gutter">
        {[...(outbox.data?.messages ?? [])]
          .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt))
          .map((message) => (
            <li key={message.id}>
              <article aria-labelledby={`mail-${message.id}`} className="rounded-card border border-rule bg-paper-raised p-gutter shadow-card">
                <header className="mb-3 flex flex-wrap items-baseline justify-between gap-2 border-b border-rule pb-3">
                  <h2 id={`mail-${message.id}`} className="text-base font-semibold">{message.subject}</h2>
                  <p className="num text-xs text-muted">{new Date(message.receivedAt).toISOString().slice(0, 19).replace("T", " ")} UTC</p>
                </header>
                <p className="mb-3 text-sm">
                  <span className="text-muted">To </span>
                  {message.to}
                </p>
                <div className="whitespace-pre-wrap text-sm leading-relaxed text-ink-soft">
                  <Linkified text={message.text} />
                </div>
              </article>
            </li>
          ))}
      </ol>
    </div>
  );
}
