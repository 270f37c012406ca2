// The demo documents seed step (scripts/seed/demo-documents.ts) against real PostgreSQL: run it
// twice and each van document exists once; the stored Yjs state loads back and compiles to the
// same Scenario the builder gives; the summary the table sorts by is the engine's figure; a
// document edited or archived by the team is left alone by the next seed.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as Y from "yjs";
import { appendDocumentChange, loadDocumentState } from "@/db/document-updates";
import { setDocumentArchived } from "@/db/documents";
import { getDb } from "@/db/pool";
import { documents, users } from "@/db/schema";
import { DEMO_DOCUMENTS } from "@/lib/demo";
import { evaluateScenarioInput, type Scenario } from "@/lib/engine";
import { compile, compileDoc, readDoc } from "@/lib/notebook";
import { setParam } from "@/lib/notebook/model";
import { seedFoundation } from "@/scripts/seed/foundation";
import { DEMO_DOCUMENTS_AUTHOR, seedDemoDocuments } from "@/scripts/seed/demo-documents";
import type { SeedContext } from "@/scripts/seed/types";

async function seedAll(): Promise<SeedContext> {
  const ctx: SeedContext = {};
  await seedFoundation(ctx);
  await seedDemoDocuments(ctx);
  return ctx;
}

const rowsOf = (workspaceId: string) => getDb().select().from(documents).where(eq(documents.workspaceId, workspaceId));

let ctx: SeedContext;
beforeAll(async () => {
  ctx = await seedAll();
  await seedAll();
});

describe("seed: demo van documents", () => {
  it("creates each document once, however often it runs", async () => {
    await seedAll();
    const rows = await rowsOf(ctx.demoWorkspaceId!);
    expect(rows.map((r) => r.name).sort()).toEqual(DEMO_DOCUMENTS.map((d) => d.name).sort());
    for (const d of DEMO_DOCUMENTS) expect(rows.find((r) => r.name === d.name)?.powertrain).toBe(d.powertrain);
  });

  it("writes them as the demo concept engineer", async () => {
    const rows = await getDb().select({ email: users.email }).from(documents).innerJoin(users, eq(users.id, documents.createdBy)).where(eq(documents.workspaceId, ctx.demoWorkspaceId!));
    expect(new Set(rows.map((r) => r.email))).toEqual(new Set([DEMO_DOCUMENTS_AUTHOR]));
  });

  it.each(DEMO_DOCUMENTS.map((d) => [d.name, d] as const))("%s loads back, compiles and matches its builder", async (_name, d) => {
    const [row] = await getDb().select().from(documents).where(and(eq(documents.workspaceId, ctx.demoWorkspaceId!), eq(documents.name, d.name)));
    const ydoc = new Y.Doc();
    Y.applyUpdate(ydoc, await loadDocumentState({ documentId: row!.id }));
    const stored = compileDoc(ydoc);
    expect(stored.messages).toEqual([]);
    expect(stored.scenario).toEqual(compile(readDoc(d.build())).scenario);
    expect(readDoc(ydoc).name).toBe(d.name);
    // the table's figures are the engine's for the stored document
    const out = evaluateScenarioInput(stored.scenario);
    if (!out.ok) throw new Error(JSON.stringify(out.errors));
    expect(row!.summary?.kpi.feasible).toBe(true);
    expect(row!.summary?.kpi.distance_km).toBeCloseTo(out.result.kpi.distance_km, 9);
    expect(row!.summary?.kpi.fuel_l_per_100km ?? null).toBe(out.result.kpi.fuel_l_per_100km);
  });

  it("leaves an edited or archived demo document as the team left it", async () => {
    const rows = await rowsOf(ctx.demoWorkspaceId!);
    const edited = rows.find((r) => r.powertrain === "bev")!;
    const archived = rows.find((r) => r.powertrain === "conventional")!;
    await appendDocumentChange({
      documentId: edited.id,
      change: (doc) => {
        const body = readDoc(doc).blocks.find((b) => b.kind === "body")!;
        setParam(doc, body.id, "rolling_resistance", "0.008");
      },
    });
    await setDocumentArchived({ documentId: archived.id, archived: true });
    await seedAll();
    const after = await rowsOf(ctx.demoWorkspaceId!);
    expect(after).toHaveLength(DEMO_DOCUMENTS.length);
    const ydoc = new Y.Doc();
    Y.applyUpdate(ydoc, await loadDocumentState({ documentId: edited.id }));
    expect((compileDoc(ydoc).scenario as Scenario | undefined)?.vehicle.rolling_resistance).toBe(0.008);
    expect(after.find((r) => r.id === archived.id)?.archivedAt).not.toBeNull();
  });
});
