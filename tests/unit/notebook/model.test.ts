import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import {
  blockIdOf, blocksOf, createBlock, dedupeBlocks, duplicateBlock, insertBlock, moveBlock, readBlocks, readDoc, removeBlock,
  setBlockProp, setMeta, setParam,
} from "@/lib/notebook/model";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { BLOCK_KINDS, BLOCK_TITLES, POWERTRAINS } from "@/lib/notebook/blocks";

const ids = (doc: Y.Doc) => readBlocks(doc).map((b) => b.id);
const kinds = (doc: Y.Doc) => readBlocks(doc).map((b) => b.kind);

function sync(a: Y.Doc, b: Y.Doc) {
  Y.applyUpdate(b, Y.encodeStateAsUpdate(a, Y.encodeStateVector(b)));
  Y.applyUpdate(a, Y.encodeStateAsUpdate(b, Y.encodeStateVector(a)));
}

describe("Yjs document helpers", () => {
  it("createBlock fills catalogue defaults and our titles", () => {
    const doc = new Y.Doc();
    const id = insertBlock(doc, "battery_pack");
    const [b] = readBlocks(doc);
    expect(b.id).toBe(id);
    expect(b.title).toBe("Battery pack");
    expect(b.params.capacity).toBe("30 Ah");
    expect(b.collapsed).toBe(false);
    expect(b.note).toBe("");
  });

  it("every kind has a title and can be inserted", () => {
    const doc = new Y.Doc();
    for (const k of BLOCK_KINDS) insertBlock(doc, k);
    expect(kinds(doc)).toEqual([...BLOCK_KINDS]);
    for (const k of BLOCK_KINDS) expect(BLOCK_TITLES[k]).toMatch(/^[A-Z]/);
  });

  it("insert at an index, move, duplicate and remove keep ids stable and unique", () => {
    const doc = new Y.Doc();
    const a = insertBlock(doc, "drive_cycle");
    const b = insertBlock(doc, "body");
    const c = insertBlock(doc, "driveline");
    const n = insertBlock(doc, "note", 0, { note: "hello" });
    expect(ids(doc)).toEqual([n, a, b, c]);

    setParam(doc, b, "mass", "1750 kg");
    moveBlock(doc, b, 0);
    expect(ids(doc)).toEqual([b, n, a, c]);
    moveBlock(doc, b, 99); // clamped to the end
    expect(ids(doc)).toEqual([n, a, c, b]);
    expect(readBlocks(doc)[3].params.mass).toBe("1750 kg"); // content travels with the block

    const d = duplicateBlock(doc, n);
    expect(ids(doc)).toEqual([n, d, a, c, b]);
    const copy = readBlocks(doc)[1];
    expect(copy.note).toBe("hello");
    expect(copy.title).toBe("Note (copy)");
    expect(new Set(ids(doc)).size).toBe(5);

    // the copy is independent
    setParam(doc, d, "x", "1");
    expect(readBlocks(doc)[0].params.x).toBeUndefined();

    removeBlock(doc, a);
    expect(ids(doc)).toEqual([n, d, c, b]);
    expect(() => removeBlock(doc, a)).toThrow(/no block/);
  });

  it("ids are random: two documents never share them", () => {
    const all = new Set<string>();
    for (let i = 0; i < 200; i++) all.add(blockIdOf(createBlock("note")));
    expect(all.size).toBe(200);
  });

  it("a move made on one replica arrives on the other with the same id", () => {
    const a = new Y.Doc();
    const b = new Y.Doc();
    const x = insertBlock(a, "engine");
    const y = insertBlock(a, "driveline");
    sync(a, b);
    moveBlock(a, y, 0);
    sync(a, b);
    expect(ids(b)).toEqual([y, x]);
  });

  it("concurrent moves of one block: readers see it once, dedupeBlocks repairs the doc", () => {
    const a = new Y.Doc();
    const b = new Y.Doc();
    const x = insertBlock(a, "engine");
    insertBlock(a, "driveline");
    insertBlock(a, "body");
    sync(a, b);
    moveBlock(a, x, 2);
    moveBlock(b, x, 1);
    sync(a, b);
    expect(blocksOf(a).length).toBe(4); // two copies in the array …
    expect(ids(a).filter((i) => i === x)).toHaveLength(1); // … one in the snapshot
    expect(ids(a)).toEqual(ids(b));
    expect(dedupeBlocks(a)).toBe(1);
    sync(a, b);
    expect(blocksOf(b).length).toBe(3);
  });

  it("meta and block properties", () => {
    const doc = new Y.Doc();
    setMeta(doc, { name: "Van A", powertrain: "series" });
    const id = insertBlock(doc, "engine");
    setBlockProp(doc, id, "collapsed", true);
    setBlockProp(doc, id, "title", "Range extender engine");
    const snap = readDoc(doc);
    expect(snap).toMatchObject({ name: "Van A", powertrain: "series" });
    expect(snap.blocks[0]).toMatchObject({ collapsed: true, title: "Range extender engine" });
    expect(readDoc(new Y.Doc()).powertrain).toBeNull();
  });

  it("templates can be adapted: texts and notes per block kind", () => {
    const doc = createScenarioDoc("bev", "Van", new Y.Doc(), {
      params: { body: { mass: "3500 kg", frontal_area: "4.2 m²" } }, notes: { note: "A 3.5 t van." },
    });
    const blocks = readBlocks(doc);
    const body = blocks.find((b) => b.kind === "body")!;
    expect(body.params.mass).toBe("3500 kg");
    expect(body.params.frontal_area).toBe("4.2 m²");
    expect(body.params.drag_coefficient).toBe("0.30"); // untouched default
    expect(blocks.find((b) => b.kind === "note")!.note).toBe("A 3.5 t van.");
  });

  it("templates: one document per powertrain, survives an encode/decode round trip", () => {
    for (const pt of POWERTRAINS) {
      const doc = createScenarioDoc(pt, `Car ${pt}`);
      const copy = new Y.Doc();
      Y.applyUpdate(copy, Y.encodeStateAsUpdate(doc));
      expect(readDoc(copy)).toEqual(readDoc(doc));
      expect(readDoc(copy).powertrain).toBe(pt);
    }
  });
});
