// A drive-cycle block that names a library item compiles through the optional resolver, and the
// uploaded samples reach the engine unchanged.
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { compile, createScenarioDoc, readDoc, findBlock, setParam, type LibraryResolver } from "@/lib/notebook";
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
  const cycles: Record<string, { dt_s: number; speed_kmh: number[] }> = { "c-1": upload.cycle };
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
