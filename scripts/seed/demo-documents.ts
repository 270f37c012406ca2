// Seed step: the demo van documents (lib/demo) in the demo workspace. Idempotent, keyed by name:
// a document whose name is already in the workspace (archived or not) is left as it is, so edits
// made in the demo survive the next `npm run demo`. Renaming one makes the seed add it again.
// Runs after the foundation step (it needs the workspace and the users).
import { and, eq, inArray } from "drizzle-orm";
import type * as Y from "yjs";
import { createDocumentFromDoc } from "../../db/document-updates";
import { getDb } from "../../db/pool";
import { documents, type DocumentSummary } from "../../db/schema";
import { DEMO_DOCUMENTS } from "../../lib/demo";
import { evaluateScenarioInput } from "../../lib/engine";
import { compileDoc } from "../../lib/notebook/compile";
import { SUMMARY_KPI_KEYS } from "../../lib/schemas/documents";
import type { SeedContext } from "./types";

/** The concept engineer of the demo team writes the documents (scripts/seed/foundation.ts). */
export const DEMO_DOCUMENTS_AUTHOR = "ben@example.com";

/** The headline figures the documents table shows, as the notebook would store them after a run. */
export function demoSummary(ydoc: Y.Doc, name: string): DocumentSummary {
  const { scenario, messages } = compileDoc(ydoc);
  if (!scenario) throw new Error(`seed: demo document "${name}" does not compile: ${messages.map((m) => m.text).join("; ")}`);
  const out = evaluateScenarioInput(scenario);
  if (!out.ok) throw new Error(`seed: demo document "${name}" does not evaluate: ${out.errors.map((e) => e.message).join("; ")}`);
  const kpi: DocumentSummary["kpi"] = { feasible: out.result.kpi.feasible };
  for (const key of SUMMARY_KPI_KEYS) {
    const v = out.result.kpi[key];
    kpi[key] = typeof v === "number" && Number.isFinite(v) ? v : null;
  }
  return { kpi, computedAt: new Date().toISOString() };
}

export async function seedDemoDocuments(ctx: SeedContext): Promise<void> {
  const workspaceId = ctx.demoWorkspaceId;
  const createdBy = ctx.userIds?.get(DEMO_DOCUMENTS_AUTHOR);
  if (!workspaceId || !createdBy) throw new Error("seed: demo documents need the demo workspace and users (run the foundation step first)");
  const names = DEMO_DOCUMENTS.map((d) => d.name);
  const existing = await getDb()
    .select({ name: documents.name })
    .from(documents)
    .where(and(eq(documents.workspaceId, workspaceId), inArray(documents.name, names)));
  const have = new Set(existing.map((r) => r.name));
  for (const d of DEMO_DOCUMENTS) {
    if (have.has(d.name)) continue;
    const ydoc = d.build();
    await createDocumentFromDoc({ workspaceId, name: d.name, powertrain: d.powertrain, createdBy, ydoc, summary: demoSummary(ydoc, d.name) });
    ydoc.destroy();
  }
}
