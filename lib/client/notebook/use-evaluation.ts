"use client";
// Live recalculation: watches the Y.Doc, sends snapshots to the evaluation worker on the
// schedule of schedule.ts, and keeps the newest answer. Results of older requests that arrive
// late are dropped (ids increase).
import { useEffect, useState } from "react";
import type * as Y from "yjs";
import { readDoc, type CompileMessage } from "@/lib/notebook";
import type { Result, Scenario } from "@/lib/engine";
import type { CompiledValues, EvaluateRequest, EvaluateResponse, ParameterValues } from "./protocol";
import { createScheduler } from "./schedule";
import { createLibraryCache } from "@/lib/library/client-cache";
import { libraryReferences } from "@/lib/library/references";

export interface EvaluationState {
  /** the last successful result (kept while the document has errors, marked stale) */
  result: Result | null;
  /** the Scenario the result was computed from */
  scenario: Scenario | null;
  /** true when the newest evaluation failed and `result` belongs to an earlier state */
  stale: boolean;
  messages: CompileMessage[];
  values: CompiledValues;
  parameters: ParameterValues;
  pending: boolean;
  elapsed_ms: number | null;
  /** increases with every answer: lets effects run once per evaluation */
  revision: number;
}

const INITIAL: EvaluationState = { result: null, scenario: null, stale: false, messages: [], values: {}, parameters: {}, pending: true, elapsed_ms: null, revision: 0 };

export function useEvaluation(doc: Y.Doc | null, workspaceId?: string): EvaluationState {
  const [state, setState] = useState<EvaluationState>(INITIAL);
  useEffect(() => {
    if (!doc) return;
    const worker = new Worker(new URL("./evaluate.worker.ts", import.meta.url), { type: "module" });
    let nextId = 1;
    let latest = 0;
    const library = workspaceId ? createLibraryCache(workspaceId, () => scheduler.poke()) : null;
    const scheduler = createScheduler(() => {
      const snapshot = readDoc(doc);
      const request: EvaluateRequest = { id: nextId++, snapshot, library: library?.lookup(libraryReferences(snapshot.blocks)) };
      latest = request.id;
      setState((s) => (s.pending ? s : { ...s, pending: true }));
      worker.postMessage(request);
    });
    worker.onmessage = (event: MessageEvent<EvaluateResponse>) => {
      const answer = event.data;
      scheduler.done();
      if (answer.id !== latest) return;
      setState((s) => ({
        result: answer.ok ? answer.result : s.result,
        scenario: answer.ok ? answer.scenario : s.scenario,
        stale: !answer.ok && s.result !== null,
        messages: answer.messages,
        values: answer.values,
        parameters: answer.parameters,
        pending: false,
        elapsed_ms: answer.elapsed_ms,
        revision: s.revision + 1,
      }));
    };
    worker.onerror = (event) => {
      scheduler.done();
      setState((s) => ({ ...s, pending: false, messages: [{ severity: "error", text: `the evaluation worker failed: ${event.message}` }] }));
    };
    const onUpdate = () => scheduler.poke();
    doc.on("update", onUpdate);
    scheduler.poke();
    return () => {
      doc.off("update", onUpdate);
      scheduler.dispose();
      worker.terminate();
    };
  }, [doc, workspaceId]);
  return state;
}
