/**
 * Worker-thread entry: runs the job the pool (pool.ts) sends, posts progress (share of DP
 * backward steps done) and the outcome. A run is synchronous and reads no messages while it
 * works, so the pool cancels by ending the thread; a cancel message only stops a run that has
 * not started yet. Imports are relative: this file runs under tsx, not under the Next bundler.
 */
import { parentPort } from "node:worker_threads";
import { runJob } from "../../lib/engine/jobs/runner";
import type { FromWorker, ToWorker } from "./protocol";

const port = parentPort;
if (!port) throw new Error("server/jobs/worker.ts must run in a worker thread");
const controllers = new Map<string, AbortController>();
const post = (m: FromWorker) => port.postMessage(m);
let lastPost = 0;

port.on("message", (msg: ToWorker) => {
  if (msg.type === "cancel") {
    controllers.get(msg.id)?.abort(new Error("cancelled"));
    return;
  }
  const controller = new AbortController();
  controllers.set(msg.id, controller);
  // Run after the current message so that a cancel already queued can arrive first.
  setImmediate(() => {
    try {
      const out = runJob(msg.request, {
        signal: controller.signal,
        onProgress: (share, phase) => {
          const now = Date.now();
          if (now - lastPost < 50 && share < 1) return;
          lastPost = now;
          post({ type: "progress", id: msg.id, share, phase });
        },
      });
      if (out.ok) post({ type: "done", id: msg.id, ok: true, value: out.value });
      else post({ type: "done", id: msg.id, ok: false, errors: out.errors });
    } catch (err) {
      post({ type: "error", id: msg.id, message: err instanceof Error ? err.message : String(err), cancelled: controller.signal.aborted });
    } finally {
      controllers.delete(msg.id);
    }
  });
});
