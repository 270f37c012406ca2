// Restoring a version = one forward transaction on the live document that makes its content
// equal to the version's snapshot. History is never rewritten: other clients receive an
// ordinary update, undo stacks keep working, and the restore itself can be undone or diffed.
import * as Y from "yjs";
import { blocksOf, metaOf, type BlockMap, type BlockSnapshot, type DocSnapshot } from "@/lib/notebook";
import { longestCommonSubsequence } from "./lcs";

/** Replaces only the middle that differs, so cursors in the unchanged prefix and suffix stay put. */
export function setText(text: Y.Text, target: string): void {
  const current = text.toString();
  if (current === target) return;
  let start = 0;
  while (start < current.length && start < target.length && current[start] === target[start]) start++;
  let end = 0;
  while (end < current.length - start && end < target.length - start && current[current.length - 1 - end] === target[target.length - 1 - end]) end++;
  text.delete(start, current.length - start - end);
  text.insert(start, target.slice(start, target.length - end));
}

function newBlockMap(b: BlockSnapshot): BlockMap {
  const map = new Y.Map<unknown>();
  map.set("id", b.id);
  map.set("kind", b.kind);
  map.set("title", b.title);
  map.set("collapsed", b.collapsed);
  const params = new Y.Map<Y.Text>();
  for (const [k, v] of Object.entries(b.params)) params.set(k, new Y.Text(v));
  map.set("params", params);
  map.set("note", new Y.Text(b.note));
  return map;
}

function updateBlock(map: BlockMap, b: BlockSnapshot): void {
  if (map.get("kind") !== b.kind) map.set("kind", b.kind);
  if (map.get("title") !== b.title) map.set("title", b.title);
  if (map.get("collapsed") !== b.collapsed) map.set("collapsed", b.collapsed);
  let params = map.get("params");
  if (!(params instanceof Y.Map)) {
    params = new Y.Map<Y.Text>();
    map.set("params", params);
  }
  const pm = params as Y.Map<unknown>;
  for (const key of [...pm.keys()]) if (!(key in b.params)) pm.delete(key);
  for (const [key, value] of Object.entries(b.params)) {
    const t = pm.get(key);
    if (t instanceof Y.Text) setText(t, value);
    else pm.set(key, new Y.Text(value));
  }
  const note = map.get("note");
  if (note instanceof Y.Text) setText(note, b.note);
  else map.set("note", new Y.Text(b.note));
}

const idOf = (m: BlockMap): string => String(m.get("id"));

/** Makes `doc` hold exactly `target` (meta and blocks), in one transaction with `origin`. */
export function applySnapshot(doc: Y.Doc, target: DocSnapshot, origin: unknown = "restore"): void {
  doc.transact(() => {
    const meta = metaOf(doc);
    if (meta.get("name") !== target.name) meta.set("name", target.name);
    if (target.powertrain === null) meta.delete("powertrain");
    else if (meta.get("powertrain") !== target.powertrain) meta.set("powertrain", target.powertrain);
    syncBlocks(blocksOf(doc), target.blocks);
  }, origin);
}

function syncBlocks(arr: Y.Array<BlockMap>, target: readonly BlockSnapshot[]): void {
  const wanted = new Set(target.map((b) => b.id));
  // drop blocks the version does not have, and duplicates of an id (left by concurrent moves)
  const seen = new Set<string>();
  for (let i = arr.length - 1; i >= 0; i--) {
    const id = idOf(arr.get(i));
    if (!wanted.has(id)) arr.delete(i, 1);
  }
  for (let i = 0; i < arr.length; i++) {
    const id = idOf(arr.get(i));
    if (seen.has(id)) arr.delete(i--, 1);
    seen.add(id);
  }
  // keep the longest run already in order; re-insert the others where the version has them
  const liveIds = arr.toArray().map(idOf);
  const keep = longestCommonSubsequence(liveIds, target.map((b) => b.id));
  for (let i = arr.length - 1; i >= 0; i--) if (!keep.has(idOf(arr.get(i)))) arr.delete(i, 1);
  target.forEach((b, index) => {
    if (keep.has(b.id)) updateBlock(arr.get(index), b);
    else arr.insert(index, [newBlockMap(b)]);
  });
}
