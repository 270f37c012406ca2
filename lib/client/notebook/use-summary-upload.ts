"use client";
// After a successful evaluation that follows this person's own edit, send the headline figures
// to the documents API (at most every THROTTLE_MS) so the documents table can sort by them.
// Also once after opening when the stored figures are missing or differ (a document created from a
// template has none yet). While the browser is offline nothing is sent; the newest figures go out
// once it is back.
import { useEffect, useRef } from "react";
import type * as Y from "yjs";
import type { Result } from "@/lib/engine";
import { putSummary, summaryKpi, type SummaryKpi } from "./documents-api";

export const THROTTLE_MS = 3000;

/** Same figures? Compared at the precision the table shows, so float noise does not count. */
function sameKpi(a: SummaryKpi, b: SummaryKpi | null | undefined): boolean {
  if (!b) return false;
  const round = (k: SummaryKpi) => JSON.stringify(Object.entries(k).sort().map(([key, v]) => [key, typeof v === "number" ? Number(v.toPrecision(6)) : v]));
  return round(a) === round(b);
}

export function useSummaryUpload(opts: {
  doc: Y.Doc; enabled: boolean; workspaceId: string; documentId: string; result: Result | null; stale: boolean;
  /** the figures stored with the document when the page was loaded */
  stored: SummaryKpi | null;
}) {
  const { doc, enabled, workspaceId, documentId, result, stale, stored } = opts;
  const localEdit = useRef(false);
  const checkedStored = useRef(false);
  const lastSent = useRef(0);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef<Result | null>(null);
  latest.current = result && !stale ? result : null;

  useEffect(() => {
    const onUpdate = (_u: Uint8Array, _origin: unknown, _doc: Y.Doc, tr: Y.Transaction) => { if (tr.local) localEdit.current = true; };
    doc.on("update", onUpdate);
    return () => doc.off("update", onUpdate);
  }, [doc]);

  useEffect(() => {
    if (!enabled) return;
    if (!checkedStored.current && result && !stale) {
      checkedStored.current = true;
      if (!sameKpi(summaryKpi(result), stored)) localEdit.current = true;
    }
    const send = () => {
      timer.current = null;
      const current = latest.current;
      if (!current || !localEdit.current || !navigator.onLine) return;
      localEdit.current = false;
      lastSent.current = Date.now();
      putSummary(workspaceId, documentId, summaryKpi(current)).catch(() => { localEdit.current = true; });
    };
    const plan = () => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(send, Math.max(0, lastSent.current + THROTTLE_MS - Date.now()));
    };
    if (latest.current && localEdit.current) plan();
    window.addEventListener("online", plan);
    return () => {
      window.removeEventListener("online", plan);
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
    };
    // `stored` is read once, on the first result.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [enabled, result, stale, workspaceId, documentId]);
}
