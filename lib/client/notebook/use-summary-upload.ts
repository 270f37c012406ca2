"use client";
// After a successful evaluation that follows this person's own edit, send the headline figures
// to the documents API (at most every THROTTLE_MS) so the documents table can sort by them.
import { useEffect, useRef } from "react";
import type * as Y from "yjs";
import type { Result } from "@/lib/engine";
import { putSummary, summaryKpi } from "./documents-api";

export const THROTTLE_MS = 3000;

export function useSummaryUpload(opts: { doc: Y.Doc; enabled: boolean; workspaceId: string; documentId: string; result: Result | null; stale: boolean }) {
  const { doc, enabled, workspaceId, documentId, result, stale } = opts;
  const localEdit = useRef(false);
  const lastSent = useRef(0);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);

  useEffect(() => {
    const onUpdate = (_u: Uint8Array, _origin: unknown, _doc: Y.Doc, tr: Y.Transaction) => { if (tr.local) localEdit.current = true; };
    doc.on("update", onUpdate);
    return () => doc.off("update", onUpdate);
  }, [doc]);

  useEffect(() => {
    if (!enabled || !result || stale || !localEdit.current) return;
    const send = () => {
      timer.current = null;
      localEdit.current = false;
      lastSent.current = Date.now();
      putSummary(workspaceId, documentId, summaryKpi(result)).catch(() => { localEdit.current = true; });
    };
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(send, Math.max(0, lastSent.current + THROTTLE_MS - Date.now()));
  }, [enabled, result, stale, workspaceId, documentId]);

  useEffect(() => () => { if (timer.current) clearTimeout(timer.current); }, []);
}
