"use client";
// Upload → confirm columns and units → preview (chart, statistics, published-cycle label) → save.
// The server validates again on save; nothing is stored while the preview shows problems.
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/client/api";
import { LIBRARY_KIND_LABELS, LIBRARY_KINDS, type LibraryKind } from "@/lib/library/kinds";
import type { UploadPreview } from "@/lib/library/preview";
import { formatIssue, type UploadIssue } from "@/lib/uploads/issues";
import { libraryKey, previewUpload, saveUpload } from "./api";
import { ConfirmForm, type Conf } from "./confirm-form";
import { PreviewChart } from "./preview-chart";
import { SummaryFigures } from "./summary-figures";

type Proposal = { layout?: { delimiter: string; decimal: string; header_rows: number; headers: string[] }; notes?: string[] };

function IssueList({ issues }: { issues: UploadIssue[] }) {
  return (
    <ul role="alert" className="space-y-1 rounded-control border border-danger bg-danger-soft p-3 text-sm text-danger">
      {issues.map((i, k) => <li key={k} className="font-mono">{formatIssue(i)}</li>)}
    </ul>
  );
}

export function UploadPanel({ workspaceId }: { workspaceId: string }) {
  const queryClient = useQueryClient();
  const [kind, setKind] = useState<LibraryKind>("cycle");
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<UploadPreview | null>(null);
  const [conf, setConf] = useState<Conf | null>(null);
  const [name, setName] = useState("");
  // the name follows the chosen file until the user types one
  const [nameTyped, setNameTyped] = useState(false);
  const [source, setSource] = useState("");
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const [saveIssues, setSaveIssues] = useState<UploadIssue[]>([]);
  // a new key clears the file input after a save
  const [inputKey, setInputKey] = useState(0);

  async function run(k: LibraryKind, f: File, c: Conf | null) {
    setBusy(true);
    setMessage(null);
    setSaveIssues([]);
    try {
      const p = await previewUpload(workspaceId, k, f, c);
      setPreview(p);
      if (p.confirmation) setConf(p.confirmation as Conf);
      else if (!c) {
        const layout = (p.proposal as Proposal | null)?.layout;
        if (layout) setConf({ delimiter: layout.delimiter, decimal: layout.decimal, header_rows: layout.header_rows });
      }
    } catch (e) {
      setMessage(e instanceof ApiError ? e.message : "The preview failed.");
    } finally {
      setBusy(false);
    }
  }

  function choose(f: File | null, k = kind) {
    setFile(f);
    setPreview(null);
    setConf(null);
    if (f) {
      if (!nameTyped) setName(f.name.replace(/\.[^.]+$/, ""));
      void run(k, f, null);
    }
  }

  async function save() {
    if (!file || !preview?.ok) return;
    setBusy(true);
    try {
      const out = await saveUpload(workspaceId, kind, file, conf, name, source);
      if (out.ok) {
        await queryClient.invalidateQueries({ queryKey: libraryKey(workspaceId) });
        setFile(null); setPreview(null); setConf(null); setName(""); setNameTyped(false); setSource(""); setInputKey((k) => k + 1);
        setMessage("Saved to the library.");
      } else {
        setSaveIssues(out.issues);
        setMessage(out.fields ? Object.values(out.fields).join("; ") : out.error);
      }
    } catch (e) {
      setMessage(e instanceof ApiError ? e.message : "Saving failed.");
    } finally {
      setBusy(false);
    }
  }

  const proposal = preview?.proposal as Proposal | null | undefined;
  const headers = proposal?.layout?.headers ?? [];
  return (
    <div className="grid gap-4">
      <div className="grid gap-3 sm:grid-cols-[auto_1fr]">
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">What it is</span>
          <select className="select py-2 pl-3 border-rule-strong" value={kind} onChange={(e) => { const k = e.target.value as LibraryKind; setKind(k); if (file) choose(file, k); }}>
            {LIBRARY_KINDS.map((k) => <option key={k} value={k}>{LIBRARY_KIND_LABELS[k]}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">CSV or TSV file (UTF-8, at most 5 MiB)</span>
          <input key={inputKey} type="file" accept=".csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain" onChange={(e) => choose(e.target.files?.[0] ?? null)} className="text-sm" />
        </label>
      </div>
      {proposal?.notes?.length ? <ul className="list-disc pl-5 text-sm text-ink-soft">{proposal.notes.map((n) => <li key={n}>{n}</li>)}</ul> : null}
      {file && conf && headers.length > 0 ? (
        <ConfirmForm kind={kind} headers={headers} value={conf} onChange={(c) => { setConf(c); void run(kind, file, c); }} />
      ) : null}
      {busy ? <p className="text-sm text-muted" aria-live="polite">Reading the file…</p> : null}
      {preview && !preview.ok ? <IssueList issues={preview.issues} /> : null}
      {preview?.ok ? (
        <div className="grid gap-3">
          {preview.summary.kind === "cycle" ? (
            <p className={`rounded-control border p-2 text-sm ${preview.summary.published_match ? "border-electric text-electric" : "border-rule text-ink-soft"}`}>
              {preview.summary.recognition}
            </p>
          ) : null}
          <PreviewChart data={preview.data} />
          <SummaryFigures summary={preview.summary} />
          {preview.warnings.length ? <ul className="list-disc pl-5 text-sm text-ink-soft">{preview.warnings.map((w) => <li key={w}>{w}</li>)}</ul> : null}
          <div className="grid gap-3 sm:grid-cols-2">
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Name</span>
              <input className="rounded-control border border-rule-strong px-3 py-2" value={name} onChange={(e) => { setName(e.target.value); setNameTyped(true); }} maxLength={120} />
            </label>
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Source note</span>
              <input className="rounded-control border border-rule-strong px-3 py-2" value={source} onChange={(e) => setSource(e.target.value)} maxLength={1000}
                placeholder="where the data comes from" />
            </label>
          </div>
          <div><Button onClick={() => void save()} disabled={busy || name.trim() === ""}>Save to the library</Button></div>
        </div>
      ) : null}
      {saveIssues.length ? <IssueList issues={saveIssues} /> : null}
      {message ? <p role="status" className="text-sm">{message}</p> : null}
    </div>
  );
}
