"use client";
// An editor asks named reviewers to review one version.
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { ApiError } from "@/lib/client/api";
import { requestReview } from "@/components/versions/api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export interface Candidate { id: string; name: string; role: string }

export function RequestReviewForm({ workspaceId, documentId, versions, candidates, defaultVersionId }: {
  workspaceId: string; documentId: string; versions: { id: string; number: number; name: string }[]; candidates: Candidate[]; defaultVersionId?: string;
}) {
  const router = useRouter();
  const id = useId();
  const [versionId, setVersionId] = useState(defaultVersionId ?? versions[0]?.id ?? "");
  const [chosen, setChosen] = useState<string[]>([]);
  const [message, setMessage] = useState("");
  const [error, setError] = useState<string>();
  const [done, setDone] = useState<string>();
  const [busy, setBusy] = useState(false);
  if (versions.length === 0) return <p className="text-sm text-muted">Save a version first; reviews are always of a saved version.</p>;
  if (candidates.length === 0) return <p className="text-sm text-muted">Nobody else in this workspace can give verdicts. Invite a reviewer first.</p>;
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    setError(undefined);
    try {
      const round = await requestReview(workspaceId, documentId, { versionId, reviewerIds: chosen, message });
      setDone(`Review of v${round.version.number} requested; the reviewers have been e-mailed.`);
      setChosen([]);
      setMessage("");
      router.refresh();
    } catch (err) {
      setError(err instanceof ApiError ? [err.message, ...Object.values(err.fields)].join(": ") : "Something went wrong. Try again.");
    } finally {
      setBusy(false);
    }
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-3" data-request-review noValidate>
      <FormMessage error={error} success={done} />
      <label htmlFor={`${id}-v`} className="text-sm font-medium">Version to review</label>
      <select id={`${id}-v`} value={versionId} onChange={(e) => setVersionId(e.target.value)} className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 text-sm">
        {versions.map((v) => <option key={v.id} value={v.id}>v{v.number} · {v.name}</option>)}
      </select>
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Reviewers</legend>
        <div className="flex flex-wrap gap-3">
          {candidates.map((c) => (
            <label key={c.id} className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={chosen.includes(c.id)} onChange={(e) => setChosen((x) => (e.target.checked ? [...x, c.id] : x.filter((y) => y !== c.id)))} />
              {c.name} <span className="text-xs text-muted">{c.role}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <label htmlFor={`${id}-m`} className="text-sm font-medium">Message (optional)</label>
      <textarea id={`${id}-m`} rows={2} value={message} onChange={(e) => setMessage(e.target.value)} className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 text-sm" />
      <Button type="submit" disabled={busy || chosen.length === 0} className="self-start">{busy ? "Requesting…" : "Request review"}</Button>
    </form>
  );
}
