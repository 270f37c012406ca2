"use client";
// Restore a version: one forward change on the live document, after a confirmation.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/lib/client/api";
import { Button } from "@/components/ui/button";
import { restoreVersion } from "./api";

export function RestoreButton({ workspaceId, documentId, versionId, label }: { workspaceId: string; documentId: string; versionId: string; label: string }) {
  const router = useRouter();
  const [state, setState] = useState<"idle" | "confirm" | "busy">("idle");
  const [note, setNote] = useState<string>();
  const run = async () => {
    setState("busy");
    try {
      const r = await restoreVersion(workspaceId, documentId, versionId);
      setNote(r.changed ? `The live document is now ${label} again (as a new change; nothing was lost).` : `The live document already equals ${label}.`);
      router.refresh();
    } catch (err) {
      setNote(err instanceof ApiError ? err.message : "Something went wrong. Try again.");
    } finally {
      setState("idle");
    }
  };
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      {state === "confirm" ? (
        <>
          <span className="text-sm">Make the live document equal to {label}?</span>
          <Button variant="danger" className="px-2 py-1" onClick={run}>Restore</Button>
          <Button variant="ghost" className="px-2 py-1" onClick={() => setState("idle")}>Cancel</Button>
        </>
      ) : (
        <Button variant="secondary" className="px-2 py-1" disabled={state === "busy"} onClick={() => setState("confirm")}>Restore<span className="sr-only"> {label}</span></Button>
      )}
      {note ? <span role="status" className="text-sm text-muted">{note}</span> : null}
    </span>
  );
}
