"use client";
// A named reviewer's verdict on a round: approve, or request changes with a comment.
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { ApiError } from "@/lib/client/api";
import { giveVerdict } from "@/components/versions/api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function VerdictForm({ workspaceId, documentId, roundId, current }: { workspaceId: string; documentId: string; roundId: string; current: "approve" | "changes_requested" | null }) {
  const router = useRouter();
  const id = useId();
  const [verdict, setVerdict] = useState<"approve" | "changes_requested">(current ?? "approve");
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string>();
  const [done, setDone] = useState<string>();
  const [busy, setBusy] = useState(false);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    setError(undefined);
    try {
      await giveVerdict(workspaceId, documentId, roundId, { verdict, comment });
      setDone(verdict === "approve" ? "You approved this version." : "You requested changes.");
      setComment("");
      router.refresh();
    } catch (err) {
      setError(err instanceof ApiError ? (err.fields.comment ?? err.message) : "Something went wrong. Try again.");
    } finally {
      setBusy(false);
    }
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-3" data-verdict-form noValidate>
      <FormMessage error={error} success={done} />
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-1 text-sm font-medium">Your verdict</legend>
        <label className="flex items-center gap-2 text-sm"><input type="radio" name={`${id}-v`} checked={verdict === "approve"} onChange={() => setVerdict("approve")} /> Approve</label>
        <label className="flex items-center gap-2 text-sm"><input type="radio" name={`${id}-v`} checked={verdict === "changes_requested"} onChange={() => setVerdict("changes_requested")} /> Request changes</label>
      </fieldset>
      <label htmlFor={`${id}-c`} className="text-sm font-medium">Comment{verdict === "changes_requested" ? " (say which changes)" : " (optional)"}</label>
      <textarea id={`${id}-c`} rows={3} value={comment} onChange={(e) => setComment(e.target.value)} className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 text-sm" />
      <Button type="submit" disabled={busy} className="self-start">{busy ? "Sending…" : "Send verdict"}</Button>
    </form>
  );
}
