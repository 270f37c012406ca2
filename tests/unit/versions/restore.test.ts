import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import {
  createScenarioDoc, insertBlock, moveBlock, readBlocks, readDoc, removeBlock, setBlockProp, setMeta, setParam,
} from "@/lib/notebook";
import { applySnapshot, diffVersions, setText } from "@/lib/versions";

function fork(doc: Y.Doc): Y.Doc {
  const copy = new Y.Doc();
  Y.applyUpdate(copy, Y.encodeStateAsUpdate(doc));
  return copy;
}
const idOfKind = (doc: Y.Doc, kind: string) => readBlocks(doc).find((b) => b.kind === kind)!.id;

describe("setText", () => {
  it("edits only the middle that differs", () => {
    const doc = new Y.Doc();
    const t = doc.getText("t");
    t.insert(0, "curb_mass + payload");
    const deltas: unknown[] = [];
    t.observe((e) => deltas.push(e.delta));
    setText(t, "curb_mass + 2 * payload");
    expect(t.toString()).toBe("curb_mass + 2 * payload");
    expect(deltas).toEqual([[{ retain: 12 }, { insert: "2 * " }]]);
    setText(t, "");
    expect(t.toString()).toBe("");
  });
});

describe("applySnapshot (restore as a forward change)", () => {
  it("turns the live document back into the version, as one update other replicas can apply", () => {
    const v1 = createScenarioDoc("conventional", "Van");
    const version = readDoc(v1);
    const live = fork(v1);
    const body = idOfKind(live, "body");
    setParam(live, body, "mass", "3500 kg");
    moveBlock(live, idOfKind(live, "engine"), 0);
    removeBlock(live, idOfKind(live, "note"));
    insertBlock(live, "energy_flow", 3);
    setBlockProp(live, idOfKind(live, "traces"), "title", "Speed and power");
    setMeta(live, { name: "Heavy van", powertrain: "bev" });

    const replica = fork(live); // a connected client
    const before = Y.encodeStateVector(live);
    applySnapshot(live, version);
    const update = Y.encodeStateAsUpdate(live, before);
    expect(readDoc(live)).toEqual(version);
    Y.applyUpdate(replica, update);
    expect(readDoc(replica)).toEqual(version);
    const d = diffVersions({ label: "v1", doc: version, summary: null }, { label: "live", doc: readDoc(live), summary: null });
    expect(d.counts).toEqual({ added: 0, removed: 0, moved: 0, changed: 0 });
  });

  it("keeps the Y.Text of an unchanged block, so an editor's binding survives", () => {
    const live = createScenarioDoc("conventional", "Van");
    const version = readDoc(live);
    const params = readBlocks(live).find((b) => b.kind === "parameters")!;
    const block = live.getArray<Y.Map<unknown>>("blocks").toArray().find((m) => m.get("id") === params.id)!;
    const text = (block.get("params") as Y.Map<Y.Text>).get("payload")!;
    setParam(live, params.id, "payload", "480 kg");
    applySnapshot(live, version);
    expect(text.toString()).toBe("80 kg");
    expect((block.get("params") as Y.Map<Y.Text>).get("payload")).toBe(text);
  });

  it("a restore merges with a concurrent edit made elsewhere (it is an ordinary update)", () => {
    const live = createScenarioDoc("conventional", "Van");
    const version = readDoc(live);
    setParam(live, idOfKind(live, "body"), "mass", "2100 kg");
    const other = fork(live);
    setParam(other, idOfKind(other, "driveline"), "efficiency", "0.93");
    applySnapshot(live, version);
    Y.applyUpdate(live, Y.encodeStateAsUpdate(other));
    Y.applyUpdate(other, Y.encodeStateAsUpdate(live));
    expect(readDoc(live)).toEqual(readDoc(other));
    const blocks = readDoc(live).blocks;
    expect(blocks.find((b) => b.kind === "body")!.params.mass).toBe("curb_mass + payload");
    expect(blocks.find((b) => b.kind === "driveline")!.params.efficiency).toBe("0.93");
  });

  it("restoring the same version twice changes nothing the second time", () => {
    const live = createScenarioDoc("series", "Bus");
    const version = readDoc(live);
    setParam(live, idOfKind(live, "battery_pack"), "capacity", "40 Ah");
    applySnapshot(live, version);
    const sv = Y.encodeStateVector(live);
    applySnapshot(live, version);
    expect(Y.encodeStateVector(live)).toEqual(sv);
  });
});
