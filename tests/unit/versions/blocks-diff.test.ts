import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import {
  createScenarioDoc, insertBlock, moveBlock, readBlocks, readDoc, removeBlock, removeParam, setBlockProp, setParam,
} from "@/lib/notebook";
import { diffVersions, movedIds } from "@/lib/versions";

const side = (label: string, doc: Y.Doc) => ({ label, doc: readDoc(doc), summary: null });

function fork(doc: Y.Doc): Y.Doc {
  const copy = new Y.Doc();
  Y.applyUpdate(copy, Y.encodeStateAsUpdate(doc));
  return copy;
}

const idOfKind = (doc: Y.Doc, kind: string) => readBlocks(doc).find((b) => b.kind === kind)!.id;

describe("movedIds (longest common subsequence)", () => {
  it("an insertion above shifts blocks without marking them moved", () => {
    expect([...movedIds(["a", "b", "c"], ["x", "a", "b", "c"])]).toEqual([]);
  });
  it("swapping two neighbours marks one of them", () => {
    expect(movedIds(["a", "b", "c"], ["b", "a", "c"]).size).toBe(1);
  });
  it("moving the first block to the end marks only it", () => {
    expect([...movedIds(["a", "b", "c", "d"], ["b", "c", "d", "a"])]).toEqual(["a"]);
  });
  it("deleted and added ids are never 'moved'", () => {
    expect([...movedIds(["a", "b", "c"], ["c", "x"])]).toEqual([]);
  });
});

describe("diffVersions: blocks", () => {
  const base = createScenarioDoc("conventional", "Van");

  it("identical documents have no changes", () => {
    const d = diffVersions(side("A", base), side("B", fork(base)));
    expect(d.counts).toEqual({ added: 0, removed: 0, moved: 0, changed: 0 });
    expect(d.blocks.every((b) => b.status === "unchanged" && !b.moved)).toBe(true);
    expect(d.blocks.map((b) => b.id)).toEqual(readBlocks(base).map((b) => b.id));
  });

  it("a changed parameter formula shows old → new text and evaluated values with units", () => {
    const b = fork(base);
    const body = idOfKind(b, "body");
    setParam(b, body, "mass", "curb_mass + payload + 600 kg");
    const d = diffVersions(side("A", base), side("B", b));
    const block = d.blocks.find((x) => x.id === body)!;
    expect(block.status).toBe("changed");
    expect(block.params).toHaveLength(1);
    const p = block.params[0]!;
    expect(p).toMatchObject({ key: "mass", label: "Test mass", change: "changed" });
    expect(p.from!.text).toBe("curb_mass + payload");
    expect(p.to!.text).toBe("curb_mass + payload + 600 kg");
    // template: curb_mass 1420 kg + payload 80 kg (lib/notebook/templates.ts) = 1500 kg; +600 kg = 2100 kg
    expect(p.from!.value).toMatchObject({ value: 1500, unit: "kg", text: "1500 kg" });
    expect(p.to!.value).toMatchObject({ value: 2100, unit: "kg" });
    expect(p.delta).toBe(600);
  });

  it("changing a named parameter shows the dependent field as a value change with the same text", () => {
    const b = fork(base);
    const params = idOfKind(b, "parameters");
    setParam(b, params, "payload", "0.68 t");
    const d = diffVersions(side("A", base), side("B", b));
    const p = d.blocks.find((x) => x.id === params)!.params;
    expect(p).toHaveLength(1);
    // 0.68 t is 680 kg; the value is shown in the unit it was written in
    expect(p[0]).toMatchObject({ key: "payload", change: "changed", delta: null });
    expect(p[0]!.to!.value).toMatchObject({ value: 0.68, unit: "t" });
    const mass = d.blocks.find((x) => x.kind === "body")!.params;
    expect(mass).toEqual([expect.objectContaining({ key: "mass", change: "value", delta: 600 })]);
    expect(mass[0]!.from!.text).toBe(mass[0]!.to!.text);
  });

  it("a formula that no longer evaluates keeps the text and says why", () => {
    const b = fork(base);
    const body = idOfKind(b, "body");
    setParam(b, body, "mass", "curb_mass + lorry");
    const p = diffVersions(side("A", base), side("B", b)).blocks.find((x) => x.id === body)!.params[0]!;
    expect(p.to!.value).toBeNull();
    expect(p.to!.error).toMatch(/lorry/);
    expect(p.delta).toBeNull();
  });

  it("moved, deleted, added and renamed blocks", () => {
    const b = fork(base);
    const engine = idOfKind(b, "engine");
    const note = idOfKind(b, "note");
    const ledger = idOfKind(b, "loss_ledger");
    moveBlock(b, engine, 0);
    removeBlock(b, note);
    const added = insertBlock(b, "energy_flow", 2);
    setBlockProp(b, ledger, "title", "Where the joules go");
    const d = diffVersions(side("A", base), side("B", b));
    const byId = new Map(d.blocks.map((x) => [x.id, x]));
    expect(byId.get(engine)).toMatchObject({ moved: true, status: "unchanged", toIndex: 0 });
    expect(byId.get(note)).toMatchObject({ status: "removed", toIndex: null, fromIndex: 0 });
    expect(byId.get(added)).toMatchObject({ status: "added", fromIndex: null, toIndex: 2 });
    expect(byId.get(ledger)).toMatchObject({ status: "changed", renamed: { from: "Loss ledger", to: "Where the joules go" } });
    expect(d.counts).toEqual({ added: 1, removed: 1, moved: 1, changed: 1 });
    // all blocks of both sides appear once
    expect(d.blocks).toHaveLength(readBlocks(base).length + 1);
    // the removed note was the first block of A; with nothing before it, it is listed first
    expect(d.blocks[0]!.id).toBe(note);
    // apart from the removed block, the order is B's
    expect(d.blocks.filter((x) => x.status !== "removed").map((x) => x.id)).toEqual(readBlocks(b).map((x) => x.id));
    // the added view block has no parameters to list
    expect(byId.get(added)!.params).toEqual([]);
  });

  it("a removed block lists its parameters as removed, an added one as added", () => {
    const b = fork(base);
    const engine = idOfKind(b, "engine");
    removeBlock(b, engine);
    const bat = insertBlock(b, "battery_pack");
    const d = diffVersions(side("A", base), side("B", b));
    const removed = d.blocks.find((x) => x.id === engine)!;
    expect(removed.params.every((p) => p.change === "removed" && p.to === null)).toBe(true);
    expect(removed.params.find((p) => p.key === "displacement")!.from!.value).toMatchObject({ value: 1.6, unit: "L" });
    const addedParams = d.blocks.find((x) => x.id === bat)!.params;
    expect(addedParams.find((p) => p.key === "capacity")).toMatchObject({ change: "added", from: null });
  });

  it("a removed parameter key and a note edit", () => {
    const b = fork(base);
    const params = idOfKind(b, "parameters");
    removeParam(b, params, "payload");
    setParam(b, params, "trailer", "750 kg");
    const d = diffVersions(side("A", base), side("B", b));
    const changes = d.blocks.find((x) => x.id === params)!.params.map((p) => [p.key, p.change]);
    expect(changes).toEqual([["payload", "removed"], ["trailer", "added"]]);
  });

  it("meta: renamed document and changed powertrain", () => {
    const b = createScenarioDoc("bev", "Van, electric");
    const d = diffVersions(side("A", base), side("B", b));
    expect(d.meta.name).toEqual({ from: "Van", to: "Van, electric" });
    expect(d.meta.powertrain).toEqual({ from: "conventional", to: "bev" });
    // separate documents share no block ids: everything is removed or added
    expect(d.counts.moved).toBe(0);
    expect(d.counts.added + d.counts.removed).toBe(readBlocks(base).length + readBlocks(b).length);
  });
});
