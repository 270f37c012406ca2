"use client";
// Save the live document as a named version (the server compiles and evaluates it).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/lib/client/api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";
import { saveVersion } from "./api";

export function SaveVersionForm({ workspaceId, documentId }: { workspaceId: string; documentId: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [message, setMessage] = useState("");
  const [fields, setFields] = useState<Record<string, string>>({});
  const [error, setError] = useState<string>();
  const [done, setDone] = useState<string>();
  const [busy, setBusy] = useState(false);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    setError(undefined);
    setFields({});
    setDone(undefined);
    try {
      const v = await saveVersion(workspaceId, documentId, { name, message });
      setDone(`Saved as v${v.number}.`);
      setName("");
      setMessage("");
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError && Object.keys(err.fields).length > 0) setFields(err.fields);
      else setError(err instanceof ApiError ? err.message : "Something went wrong. Try again.");
    } finally {
      setBusy(false);
    }
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-3" data-save-version noValidate>
      <FormMessage error={error} success={done} />
      <TextField label="Version name" value={name} onChange={(e) => setName(e.target.value)} error={fields.name} maxLength={120} placeholder="e.g. Loaded van, 2.1 t" />
      <TextField label="Message (optional)" value={message} onChange={(e) => setMessage(e.target.value)} error={fields.message} maxLength={2000} placeholder="What changed and why" />
      <Button type="submit" disabled={busy} className="self-start">{busy ? "Saving…" : "Save version"}</Button>
    </form>
  );
}
