// Engine full-load curves and battery OCV curves from the workspace library: a block names the
// item by id, compile takes the curve through the resolver (checking its kind), and the list
// fields it replaces are left out. Expected values are the fixture data themselves.
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { compile, createScenarioDoc, readDoc, setParam, type LibraryItemData, type LibraryResolver } from "@/lib/notebook";
import { evaluateScenarioInput } from "@/lib/engine";
import { libraryReferences } from "@/lib/library/references";
import { runEvaluation } from "@/lib/client/notebook/run-evaluation";
import { previewFullLoad, previewOcv } from "@/lib/uploads";

const fullLoad = previewFullLoad({ text: "speed [rpm],torque [N·m]\n800,100\n3000,160\n6000,120\n" });
const ocv = previewOcv({ text: "SOC [%],OCV [V]\n0,300\n50,360\n100,400\n" });
if (!fullLoad.ok || !ocv.ok) throw new Error("fixture uploads failed");

const items: Record<string, LibraryItemData> = {
  "fl-1": { kind: "engine_full_load", name: "1.6 L NA", data: fullLoad.data },
  "ocv-1": { kind: "battery_ocv", name: "NMC pack", data: ocv.data },
  "cyc-1": { kind: "cycle", name: "Ring road", data: { dt_s: 1, speed_kmh: [0, 10, 20, 10, 0] } },
  // idle 800 rpm in the templates: this curve starts above it
  "fl-narrow": { kind: "engine_full_load", name: "narrow", data: { speed_rpm: [1000, 5000], torque_nm: [120, 140] } },
};
const resolve: LibraryResolver = (id) => items[id] ?? `no item "${id}" in this workspace's library`;

function docWith(powertrain: "conventional" | "bev", kind: "engine" | "battery_pack", params: Record<string, string>) {
  const doc = createScenarioDoc(powertrain, "library components", new Y.Doc());
  const block = readDoc(doc).blocks.find((b) => b.kind === kind)!;
  for (const [k, v] of Object.entries(params)) setParam(doc, block.id, k, v);
  return { snap: readDoc(doc), blockId: block.id };
}

const errors = (out: ReturnType<typeof compile>) => out.messages.filter((m) => m.severity === "error");

describe("engine full-load curve from the library", () => {
  it("replaces the list fields (even broken ones) and reaches the engine", () => {
    const { snap } = docWith("conventional", "engine", { full_load_library_id: "fl-1", full_load_speeds: "not a list" });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(errors(out)).toEqual([]);
    expect((out.scenario?.engine as Record<string, unknown>).max_torque_nm).toEqual({ speed_rpm: [800, 3000, 6000], torque_nm: [100, 160, 120] });
    expect(evaluateScenarioInput(out.scenario).ok).toBe(true);
    expect(libraryReferences(snap.blocks)).toEqual(["fl-1"]);
  });

  it("refuses an id of another kind on the block's field, naming both kinds", () => {
    const { snap, blockId } = docWith("conventional", "engine", { full_load_library_id: "ocv-1" });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(out.scenario).toBeUndefined();
    expect(errors(out)).toEqual([expect.objectContaining({
      blockId, field: "full_load_library_id",
      text: 'Engine › full-load curve: library item "NMC pack" is a battery OCV curve, not an engine full-load curve',
    })]);
  });

  it("reports a missing id, and says the library is not available without a resolver", () => {
    const { snap, blockId } = docWith("conventional", "engine", { full_load_library_id: "gone" });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(errors(out)).toEqual([expect.objectContaining({ blockId, field: "full_load_library_id", text: expect.stringContaining('no item "gone"') })]);
    const without = compile(snap);
    expect(errors(without)).toEqual([expect.objectContaining({ blockId, field: "full_load_library_id", text: expect.stringContaining("not available here") })]);
  });

  it("maps the engine's own rule on the curve back to the reference field", () => {
    const { snap, blockId } = docWith("conventional", "engine", { full_load_library_id: "fl-narrow" });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(errors(out)).toEqual([expect.objectContaining({ blockId, field: "full_load_library_id", text: expect.stringContaining("must span idle_speed_rpm..max_speed_rpm") })]);
  });

  it("an empty reference keeps the list fields", () => {
    const { snap } = docWith("conventional", "engine", { full_load_library_id: "  " });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(errors(out)).toEqual([]);
    expect((out.scenario?.engine as { max_torque_nm: { speed_rpm: number[] } }).max_torque_nm.speed_rpm).toEqual([800, 1500, 2500, 3500, 4500, 5500, 6000]);
    expect(libraryReferences(snap.blocks)).toEqual([]);
  });
});

describe("battery OCV curve from the library", () => {
  it("replaces the OCV points; SOC stays a fraction", () => {
    const { snap } = docWith("bev", "battery_pack", { ocv_library_id: "ocv-1" });
    const out = compile({ ...snap, resolveLibrary: resolve });
    expect(errors(out)).toEqual([]);
    expect((out.scenario?.battery as Record<string, unknown>).ocv).toEqual({ soc: [0, 0.5, 1], voltage_v: [300, 360, 400] });
  });

  it("refuses a drive cycle named as OCV curve, and a full-load curve named as drive cycle", () => {
    const { snap, blockId } = docWith("bev", "battery_pack", { ocv_library_id: "cyc-1" });
    expect(errors(compile({ ...snap, resolveLibrary: resolve }))).toEqual([expect.objectContaining({
      blockId, field: "ocv_library_id", text: 'Battery pack › open-circuit voltage: library item "Ring road" is a drive cycle, not a battery OCV curve',
    })]);
    const cyc = docWith("bev", "battery_pack", {});
    const cycleBlock = cyc.snap.blocks.find((b) => b.kind === "drive_cycle")!;
    const blocks = cyc.snap.blocks.map((b) => (b.id === cycleBlock.id ? { ...b, params: { ...b.params, source: "library", library_id: "fl-1" } } : b));
    expect(errors(compile({ ...cyc.snap, blocks, resolveLibrary: resolve }))).toEqual([expect.objectContaining({
      blockId: cycleBlock.id, field: "library_id", text: 'Drive cycle › library cycle: library item "1.6 L NA" is an engine full-load curve, not a drive cycle',
    })]);
  });

  it("the browser worker resolves it from the entries sent with the request, and waits while loading", () => {
    const { snap } = docWith("bev", "battery_pack", { ocv_library_id: "ocv-1" });
    const ok = runEvaluation(1, snap, { "ocv-1": items["ocv-1"] });
    expect(ok.ok).toBe(true);
    if (ok.ok) expect(ok.scenario.battery?.ocv.voltage_v).toEqual([300, 360, 400]);
    const loading = runEvaluation(2, snap, {});
    expect(loading.messages).toContainEqual(expect.objectContaining({ field: "ocv_library_id", text: "Battery pack › open-circuit voltage: loading from the library…" }));
  });
});
