import * as Y from "yjs";
import { BLOCK_TITLES, isBlockKind, POWERTRAINS, type BlockKind, type PowertrainKind } from "./block-kinds";
import { FIELDS } from "./blocks";

/**
 * The Yjs shape of a scenario document:
 *   doc.getArray("blocks"): Y.Array<Y.Map>, one map per block with
 *     id: string (stable, random), kind: BlockKind, title: string, collapsed: boolean,
 *     params: Y.Map<Y.Text> (field key or parameter name → text), note: Y.Text
 *   doc.getMap("meta"): name: string, powertrain: PowertrainKind
 * Y.Array has no move: a move deletes the block and inserts a deep copy with the same id in
 * one transaction. Two people moving the same block at once can leave two copies; readBlocks
 * keeps the first of each id, and dedupeBlocks removes the extra ones from the document.
 */
export const BLOCKS_KEY = "blocks";
export const META_KEY = "meta";

export type BlockMap = Y.Map<unknown>;

export interface BlockSnapshot {
  id: string;
  kind: BlockKind;
  title: string;
  collapsed: boolean;
  params: Record<string, string>;
  note: string;
}

export interface DocSnapshot extends DocMeta {
  blocks: BlockSnapshot[];
}

export function blocksOf(doc: Y.Doc): Y.Array<BlockMap> {
  return doc.getArray<BlockMap>(BLOCKS_KEY);
}

export function metaOf(doc: Y.Doc): Y.Map<unknown> {
  return doc.getMap(META_KEY);
}

/** 96 random bits, hex; getRandomValues works in browsers on plain http too (randomUUID does not). */
export function newBlockId(): string {
  const bytes = new Uint8Array(12);
  globalThis.crypto.getRandomValues(bytes);
  return "b" + Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
}

export interface BlockInit {
  title?: string;
  /** texts for fields or (in a parameters block) named parameters; missing catalogue fields get their defaults */
  params?: Record<string, string>;
  note?: string;
  collapsed?: boolean;
  /** start fields empty rather than with catalogue defaults */
  empty?: boolean;
}

// Yjs warns when a map is read before it joins a document, so remember ids of new maps here.
const pendingIds = new WeakMap<BlockMap, string>();

/** The id of a block map, inserted or still pending. */
export function blockIdOf(block: BlockMap): string {
  const pending = pendingIds.get(block);
  if (pending !== undefined && !block.doc) return pending;
  return String(block.get("id"));
}

/** A new, not yet inserted block map with catalogue defaults. */
export function createBlock(kind: BlockKind, init: BlockInit = {}): BlockMap {
  const block = new Y.Map<unknown>();
  const id = newBlockId();
  pendingIds.set(block, id);
  block.set("id", id);
  block.set("kind", kind);
  block.set("title", init.title ?? BLOCK_TITLES[kind]);
  block.set("collapsed", init.collapsed ?? false);
  const params = new Y.Map<Y.Text>();
  const texts: Record<string, string> = {};
  if (!init.empty) for (const f of FIELDS[kind]) texts[f.key] = f.default;
  Object.assign(texts, init.params ?? {});
  for (const [key, text] of Object.entries(texts)) params.set(key, new Y.Text(text));
  block.set("params", params);
  block.set("note", new Y.Text(init.note ?? ""));
  return block;
}

export function blockIndex(doc: Y.Doc, id: string): number {
  const arr = blocksOf(doc);
  for (let i = 0; i < arr.length; i++) if (arr.get(i).get("id") === id) return i;
  return -1;
}

export function findBlock(doc: Y.Doc, id: string): BlockMap | undefined {
  const i = blockIndex(doc, id);
  return i < 0 ? undefined : blocksOf(doc).get(i);
}

function requireIndex(doc: Y.Doc, id: string): number {
  const i = blockIndex(doc, id);
  if (i < 0) throw new Error(`no block with id ${id}`);
  return i;
}

function clampIndex(index: number | undefined, length: number): number {
  if (index === undefined) return length;
  return Math.max(0, Math.min(length, Math.trunc(index)));
}

/** Inserts a block (a kind, or a map from createBlock) at index (default: the end); returns its id. */
export function insertBlock(doc: Y.Doc, what: BlockKind | BlockMap, index?: number, init?: BlockInit): string {
  const block = typeof what === "string" ? createBlock(what, init) : what;
  const id = blockIdOf(block);
  const arr = blocksOf(doc);
  doc.transact(() => arr.insert(clampIndex(index, arr.length), [block]));
  return id;
}

/** Moves a block so that it ends up at position `to` (0-based, clamped). Keeps its id. */
export function moveBlock(doc: Y.Doc, id: string, to: number): void {
  const arr = blocksOf(doc);
  const from = requireIndex(doc, id);
  const target = clampIndex(to, arr.length - 1);
  if (from === target) return;
  doc.transact(() => {
    const copy = arr.get(from).clone() as BlockMap;
    arr.delete(from, 1);
    arr.insert(target, [copy]);
  });
}

/** Inserts a copy right after the block, with a new id and " (copy)" title; returns the new id. */
export function duplicateBlock(doc: Y.Doc, id: string): string {
  const arr = blocksOf(doc);
  const from = requireIndex(doc, id);
  const copy = arr.get(from).clone() as BlockMap;
  const newId = newBlockId();
  copy.set("id", newId);
  copy.set("title", `${String(arr.get(from).get("title") ?? "")} (copy)`);
  doc.transact(() => arr.insert(from + 1, [copy]));
  return newId;
}

export function removeBlock(doc: Y.Doc, id: string): void {
  const i = requireIndex(doc, id);
  doc.transact(() => blocksOf(doc).delete(i, 1));
}

/** Removes later duplicates of an id (left by concurrent moves). */
export function dedupeBlocks(doc: Y.Doc): number {
  const arr = blocksOf(doc);
  const seen = new Set<string>();
  const extra: number[] = [];
  arr.forEach((b, i) => {
    const id = b.get("id") as string;
    if (seen.has(id)) extra.push(i);
    seen.add(id);
  });
  doc.transact(() => { for (const i of extra.reverse()) arr.delete(i, 1); });
  return extra.length;
}

/** Replaces the whole text of one parameter (creating it if needed). */
export function setParam(doc: Y.Doc, id: string, key: string, text: string): void {
  const block = findBlock(doc, id);
  if (!block) throw new Error(`no block with id ${id}`);
  const params = block.get("params") as Y.Map<Y.Text>;
  doc.transact(() => {
    const t = params.get(key);
    if (t instanceof Y.Text) {
      t.delete(0, t.length);
      t.insert(0, text);
    } else params.set(key, new Y.Text(text));
  });
}

export function removeParam(doc: Y.Doc, id: string, key: string): void {
  const block = findBlock(doc, id);
  if (!block) throw new Error(`no block with id ${id}`);
  doc.transact(() => (block.get("params") as Y.Map<Y.Text>).delete(key));
}

export function setBlockProp(doc: Y.Doc, id: string, prop: "title" | "collapsed", value: string | boolean): void {
  const block = findBlock(doc, id);
  if (!block) throw new Error(`no block with id ${id}`);
  doc.transact(() => block.set(prop, value));
}

function readBlock(b: BlockMap): BlockSnapshot | undefined {
  const kind = b.get("kind");
  const id = b.get("id");
  if (!isBlockKind(kind) || typeof id !== "string") return undefined;
  const params: Record<string, string> = {};
  const pm = b.get("params");
  if (pm instanceof Y.Map) pm.forEach((v, k) => { params[k] = v instanceof Y.Text ? v.toString() : String(v ?? ""); });
  const note = b.get("note");
  const title = b.get("title");
  return {
    id, kind, params,
    title: typeof title === "string" ? title : BLOCK_TITLES[kind],
    collapsed: b.get("collapsed") === true,
    note: note instanceof Y.Text ? note.toString() : "",
  };
}

/** Plain snapshot of the blocks in order; unknown kinds are skipped, duplicate ids kept once. */
export function readBlocks(doc: Y.Doc): BlockSnapshot[] {
  const seen = new Set<string>();
  const out: BlockSnapshot[] = [];
  for (const b of blocksOf(doc).toArray()) {
    const s = readBlock(b);
    if (!s || seen.has(s.id)) continue;
    seen.add(s.id);
    out.push(s);
  }
  return out;
}

export function setMeta(doc: Y.Doc, meta: { name?: string; powertrain?: PowertrainKind }): void {
  const m = metaOf(doc);
  doc.transact(() => {
    if (meta.name !== undefined) m.set("name", meta.name);
    if (meta.powertrain !== undefined) m.set("powertrain", meta.powertrain);
  });
}

export interface DocMeta {
  name: string;
  /** null when the document has none (or an unknown one) */
  powertrain: PowertrainKind | null;
}

/** The document's name and powertrain; an unknown powertrain reads as null. */
export function readMeta(doc: Y.Doc): DocMeta {
  const m = metaOf(doc);
  const name = m.get("name");
  const pt = m.get("powertrain");
  return {
    name: typeof name === "string" ? name : "",
    powertrain: (POWERTRAINS as readonly unknown[]).includes(pt) ? (pt as PowertrainKind) : null,
  };
}

export function readDoc(doc: Y.Doc): DocSnapshot {
  return { ...readMeta(doc), blocks: readBlocks(doc) };
}
