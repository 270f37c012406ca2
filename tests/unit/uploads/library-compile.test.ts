// A drive-cycle block that names a library item compiles through the optional resolver, and the
// uploaded samples reach the engine unchanged.
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { compile, createScenarioDoc, readDoc, findBlock, setParam, type LibraryItemData, type LibraryResolver } from "@/lib/notebook";
import { evaluateScenarioInput } from "@/lib/engine";
import { libraryReferences } from "@/lib/library/references";
import { previewCycle } from "@/lib/uploads";

function docWithLibraryCycle(id: string) {
  const doc = createScenarioDoc("bev", "library test", new Y.Doc());
  const snap = readDoc(doc);
  const cycleBlock = snap.blocks.find((b) => b.kind === "drive_cycle")!;
  setParam(doc, cycleBlock.id, "source", "library");
  setParam(doc, cycleBlock.id, "library_id", id);
  expect(findBlock(doc, cycleBlock.id)).toBeDefined();
  return { snap: readDoc(doc), blockId: cycleBlock.id };
}

describe("library cycles in the notebook compile", () => {
  const upload = previewCycle({ text: "time [s],speed [km/h]\n0,0\n10,36\n20,36\n30,0\n" });
  if (!upload.ok) throw new Error("fixture upload failed");
  const cycles: Record<string, LibraryItemData> = { "c-1": { kind: "cycle", name: "upload", data: upload.cycle } };
  const resolve: LibraryResolver = (id) => cycles[id] ?? `no cycle "${id}" in this workspace's library`;

  it("finds the referenced ids", () => {
    const { snap } = docWithLibraryCycle("c-1");
    expect(libraryReferences(snap.blocks)).toEqual(["c-1"]);
  });

  it("puts the resolved samples into the Scenario and the engine integrates them", () => {
    const { snap } = docWithLibraryCycle("c-1");
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(out.messages.filter((m) => m.severity === "error")).toEqual([]);
    expect(out.scenario?.cycle).toEqual({ dt_s: 10, speed_kmh: [0, 36, 36, 0] });
    const r = evaluateScenarioInput(out.scenario);
    expect(r.ok).toBe(true);
    // trapezoid: (0+10)/2·10 + 10·10 + (10+0)/2·10 = 50 + 100 + 50 = 200 m
    if (r.ok) expect(r.result.kpi.distance_km).toBeCloseTo(0.2, 12);
  });

  it("reports an unknown id on the block's field, and keeps the old message without a resolver", () => {
    const { snap, blockId } = docWithLibraryCycle("c-404");
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(out.scenario).toBeUndefined();
    expect(out.messages).toContainEqual(expect.objectContaining({ blockId, field: "library_id", severity: "error", text: expect.stringContaining('no cycle "c-404" in this workspace\'s library') }));
    const without = compile(snap);
    expect(without.messages.some((m) => m.field === "library_id" && m.text.includes("not available yet"))).toBe(true);
  });
});

describe("library cycles in the notebook's live evaluation", () => {
  it("runEvaluation uses the library entries sent with the request", async () => {
    const { runEvaluation } = await import("@/lib/client/notebook/run-evaluation");
    const { snap } = docWithLibraryCycle("c-1");
    const out = runEvaluation(1, snap, { "c-1": { kind: "cycle", name: "c", data: { dt_s: 10, speed_kmh: [0, 36, 36, 0] } } });
    expect(out.ok).toBe(true);
    if (out.ok) expect(out.result.kpi.distance_km).toBeCloseTo(0.2, 12);
    const loading = runEvaluation(2, snap, {});
    expect(loading.ok).toBe(false);
    expect(loading.messages.some((m) => m.field === "library_id" && m.text.includes("loading from the library"))).toBe(true);
  });

  it("the browser cache fetches each id once, then re-runs with the data", async () => {
    const { createLibraryCache } = await import("@/lib/library/client-cache");
    const id = "0b9c1d2e-3f40-4a5b-8c6d-7e8f90a1b2c3";
    const calls: string[] = [];
    const fetchStub = async (url: string) => {
      calls.push(url);
      return new Response(JSON.stringify({ item: { kind: "cycle", name: "x", data: { dt_s: 1, speed_kmh: [0, 1] } } }), { status: 200 });
    };
    const original = globalThis.fetch;
    globalThis.fetch = fetchStub as unknown as typeof fetch;
    try {
      let reruns = 0;
      const cache = createLibraryCache("w-1", () => { reruns++; });
      expect(cache.lookup([id])[id]).toBe("loading from the library…");
      expect(cache.lookup([id])[id]).toBe("loading from the library…");
      await new Promise((r) => setTimeout(r, 0));
      expect(reruns).toBe(1);
      expect(cache.lookup([id])[id]).toEqual({ kind: "cycle", name: "x", data: { dt_s: 1, speed_kmh: [0, 1] } });
      expect(calls).toEqual([`/api/workspaces/w-1/library/${id}`]);
      expect(cache.lookup(["not-an-id"])["not-an-id"]).toBe('"not-an-id" is not a library id (choose an item from the list)');
    } finally {
      globalThis.fetch = original;
    }
  });
});
