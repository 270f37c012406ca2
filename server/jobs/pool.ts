import { Worker } from "node:worker_threads";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { JobExecutor } from "../../lib/engine/jobs/store";
import type { FromWorker, ToWorker } from "./protocol";

/**
 * Worker threads for long runs. A DP job is synchronous CPU work, so it must not run on the
 * thread that serves HTTP. Each job gets its own worker thread (started on demand, ended when
 * the job ends or is cancelled, so a cancelled job frees its CPU at once even between two
 * abort checks). The worker loads the TypeScript engine through tsx's ESM hook, by file path
 * from the project root (JOULEBOOK_ROOT, else the working directory): the Next bundler never
 * sees it.
 */
export function workerExecutor(root = process.env.JOULEBOOK_ROOT ?? process.cwd()): JobExecutor {
  const entry = pathToFileURL(join(root, "server/jobs/worker.ts")).href;
  const boot = `import("tsx/esm/api").then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
  return (key, payload, hooks) =>
    new Promise((resolve, reject) => {
      const worker = new Worker(boot, { eval: true });
      const id = key;
      const finish = () => void worker.terminate();
      worker.on("message", (m: FromWorker) => {
        if (m.type === "progress") hooks.onProgress(m.share, m.phase);
        else if (m.type === "done") {
          finish();
          resolve(m.ok ? { ok: true, value: m.value } : { ok: false, errors: m.errors });
        } else {
          finish();
          reject(new Error(m.cancelled ? "cancelled" : m.message));
        }
      });
      worker.on("error", (err) => { finish(); reject(err); });
      worker.on("exit", (code) => { if (code !== 0) reject(new Error(`job worker exited with code ${code}`)); });
      hooks.signal.addEventListener("abort", () => {
        worker.postMessage({ type: "cancel", id } satisfies ToWorker);
        finish();
        reject(new Error("cancelled"));
      }, { once: true });
      worker.postMessage({ type: "run", id, request: payload as { scenario: unknown; compare: boolean } } satisfies ToWorker);
    });
}
