// Web Worker: live recalculation off the main thread (DESIGN §2). One request at a time comes
// in (the page never queues more than one); an exception becomes a message, never a dead worker.
import type { EvaluateRequest, EvaluateResponse } from "./protocol";
import { runEvaluation } from "./run-evaluation";

const scope = self as unknown as { onmessage: ((e: MessageEvent<EvaluateRequest>) => void) | null; postMessage: (m: EvaluateResponse) => void };

scope.onmessage = (event) => {
  const { id, snapshot, library } = event.data;
  try {
    scope.postMessage(runEvaluation(id, snapshot, library));
  } catch (error) {
    const text = error instanceof Error ? error.message : String(error);
    scope.postMessage({ id, ok: false, messages: [{ severity: "error", text: `evaluation failed: ${text}` }], values: {}, parameters: {}, elapsed_ms: 0 });
  }
};
