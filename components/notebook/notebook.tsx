"use client";
// An open scenario document: header (name, powertrain, connection, people, undo/redo), the
// blocks in order, document-level messages, and the cautions under the results.
import { useCallback, useMemo } from "react";
import type { Finding } from "@/lib/engine";
import { POWERTRAIN_LABELS, POWERTRAINS, setMeta, type CompileMessage, type PowertrainKind } from "@/lib/notebook";
import type { Collab } from "@/lib/client/notebook/use-collab";
import { useBlocks, useMeta } from "@/lib/client/notebook/use-blocks";
import { useEvaluation } from "@/lib/client/notebook/use-evaluation";
import { useUndo } from "@/lib/client/notebook/use-undo";
import { usePeers } from "@/lib/client/notebook/use-peers";
import { setFocusedBlock } from "@/lib/client/notebook/presence";
import { findingsByBlock } from "@/lib/client/notebook/findings";
import { useSummaryUpload } from "@/lib/client/notebook/use-summary-upload";
import type { SummaryKpi } from "@/lib/client/notebook/documents-api";
import { useStableEntries } from "@/lib/client/notebook/stable";
import type { Peer } from "@/lib/client/notebook/presence";
import { Button } from "@/components/ui/button";
import { EvaluationContext, NotebookContext, type NotebookContextValue } from "./notebook-context";
import { BlockCard } from "./block-card";
import { AddBlockMenu } from "./add-block-menu";
import { ConnectionBadge, ConnectionEnded, isEnded } from "./connection-badge";
import { PresenceBar } from "./presence-bar";
import { Cautions } from "./result-state";
import { EmptyDocument } from "./empty-document";
import { DocumentMessages } from "./document-messages";

export interface NotebookProps {
  collab: Collab;
  canEdit: boolean;
  archived: boolean;
  role: string;
  workspaceId: string;
  documentId: string;
  fallbackName: string;
  fallbackPowertrain: PowertrainKind | null;
  storedSummary: SummaryKpi | null;
}

const NO_FINDINGS: Finding[] = [];
const NO_MESSAGES: CompileMessage[] = [];
const NO_PEERS: Peer[] = [];

export function Notebook({ collab, canEdit, archived, role, workspaceId, documentId, fallbackName, fallbackPowertrain, storedSummary }: NotebookProps) {
  const { doc, awareness } = collab;
  const undo = useUndo(doc, canEdit);
  const evaluation = useEvaluation(collab.synced ? doc : null, workspaceId);
  const blocks = useBlocks(doc, canEdit);
  const meta = useMeta(doc);
  const peers = usePeers(awareness);
  useSummaryUpload({ doc, enabled: canEdit, workspaceId, documentId, result: evaluation.result, stale: evaluation.stale, stored: storedSummary });
  const focusBlock = useCallback((id: string) => setFocusedBlock(awareness, id), [awareness]);
  // Typing merges within the capture window; a command is always one step of its own.
  const step = useCallback((change: () => void) => {
    undo.manager.stopCapturing();
    change();
    undo.manager.stopCapturing();
  }, [undo.manager]);

  // Per-block props keep their identity while unchanged, so a recalculation or a cursor move
  // re-renders only the blocks it concerns (and the result views).
  const messagesByBlock = useStableEntries(useMemo(() => {
    const m = new Map<string, CompileMessage[]>();
    for (const msg of evaluation.messages) { const k = msg.blockId ?? ""; m.set(k, [...(m.get(k) ?? []), msg]); }
    return m;
  }, [evaluation.messages]));
  const findings = useStableEntries(useMemo(
    () => findingsByBlock(evaluation.result && !evaluation.stale ? evaluation.result.findings : [], blocks),
    [evaluation.result, evaluation.stale, blocks],
  ));
  const peersByBlock = useStableEntries(useMemo(() => {
    const m = new Map<string, Peer[]>();
    for (const p of peers) if (p.blockId && !p.self) m.set(p.blockId, [...(m.get(p.blockId) ?? []), p]);
    return m;
  }, [peers]));
  const valuesByBlock = useStableEntries(useMemo(() => new Map(Object.entries(evaluation.values)), [evaluation.values]));

  const context: NotebookContextValue = useMemo(
    () => ({ doc, awareness, undoManager: undo.manager, canEdit, blocks, focusBlock, step, workspaceId }),
    [doc, awareness, undo.manager, canEdit, blocks, focusBlock, step, workspaceId],
  );
  const name = meta.name || fallbackName;
  const powertrain = meta.powertrain ?? fallbackPowertrain;

  return (
    <NotebookContext.Provider value={context}>
      <EvaluationContext.Provider value={evaluation}>
      <div className="sticky top-0 z-10 -mx-gutter mb-gutter border-b border-rule bg-paper/95 px-gutter py-3 backdrop-blur">
        <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
          <h1 className="text-xl font-semibold" data-document-name>{name || "Untitled scenario"}</h1>
          <PowertrainControl value={powertrain} canEdit={canEdit} onChange={(p) => step(() => setMeta(doc, { powertrain: p }))} />
          <ConnectionBadge state={collab.connection} unsynced={collab.unsynced} />
          {evaluation.pending ? <span className="text-xs text-muted" aria-live="polite">calculating…</span> : null}
          <div className="ml-auto flex items-center gap-2">
            {canEdit ? (
              <>
                <Button variant="ghost" className="px-2.5 py-1.5" onClick={undo.undo} disabled={!undo.canUndo} title="Undo (Ctrl/Cmd+Z)">Undo</Button>
                <Button variant="ghost" className="px-2.5 py-1.5" onClick={undo.redo} disabled={!undo.canRedo} title="Redo (Ctrl/Cmd+Shift+Z)">Redo</Button>
                <AddBlockMenu />
              </>
            ) : null}
          </div>
        </div>
        <div className="mt-2"><PresenceBar peers={peers} /></div>
      </div>
      {isEnded(collab.connection) ? <ConnectionEnded state={collab.connection} /> : null}
      {canEdit ? null : (
        <p className="mb-gutter rounded-control bg-paper-sunk px-4 py-2.5 text-sm text-ink-soft" data-read-only>
          {archived
            ? "This document is archived: it opens read-only until someone unarchives it from the documents list."
            : `You are a ${role} in this workspace: you can read this document and follow the figures live, but not change it.`}
        </p>
      )}
      {blocks.length > 0 ? <DocumentMessages messages={messagesByBlock.get("") ?? NO_MESSAGES} findings={findings.get("") ?? NO_FINDINGS} /> : null}
      {collab.synced && blocks.length === 0 ? <EmptyDocument canEdit={canEdit} powertrain={powertrain} name={name} /> : null}
      <div className="space-y-4">
        {blocks.map((b, i) => (
          <BlockCard key={b.id} id={b.id} kind={b.kind} map={b.map} index={i} count={blocks.length}
            messages={messagesByBlock.get(b.id) ?? NO_MESSAGES} findings={findings.get(b.id) ?? NO_FINDINGS} peers={peersByBlock.get(b.id) ?? NO_PEERS}
            values={valuesByBlock.get(b.id)} />
        ))}
      </div>
      {canEdit && blocks.length > 0 ? <div className="mt-4"><AddBlockMenu /></div> : null}
      <footer className="mt-section border-t border-rule pt-4"><Cautions /></footer>
      </EvaluationContext.Provider>
    </NotebookContext.Provider>
  );
}

function PowertrainControl({ value, canEdit, onChange }: { value: PowertrainKind | null; canEdit: boolean; onChange: (p: PowertrainKind) => void }) {
  if (!canEdit) return <span className="rounded-full bg-paper-sunk px-2.5 py-0.5 text-xs font-medium text-ink-soft">{value ? POWERTRAIN_LABELS[value] : "no powertrain"}</span>;
  return (
    <label className="flex items-center gap-2 text-xs text-muted">
      Powertrain
      <select value={value ?? ""} onChange={(e) => onChange(e.target.value as PowertrainKind)} className="rounded-control border border-rule-strong bg-paper-raised px-2 py-1 text-sm text-ink">
        {value ? null : <option value="">choose…</option>}
        {POWERTRAINS.map((p) => <option key={p} value={p}>{POWERTRAIN_LABELS[p]}</option>)}
      </select>
    </label>
  );
}
