"use client";
// The ordered block maps of a document, re-read only when the array itself changes (insert,
// delete, move) — typing inside a block does not re-render the list. Copies left by two people
// moving the same block at once are shown once and, for editors, removed from the document.
import { useEffect, useState } from "react";
import type * as Y from "yjs";
import { blocksOf, dedupeBlocks, metaOf, readMeta, type BlockMap, type DocMeta } from "@/lib/notebook";
import { isBlockKind, type BlockKind } from "@/lib/notebook";

export interface BlockRef {
  id: string;
  kind: BlockKind;
  map: BlockMap;
}

function read(doc: Y.Doc): BlockRef[] {
  const seen = new Set<string>();
  const out: BlockRef[] = [];
  for (const map of blocksOf(doc).toArray()) {
    const id = map.get("id");
    const kind = map.get("kind");
    if (typeof id !== "string" || !isBlockKind(kind) || seen.has(id)) continue;
    seen.add(id);
    out.push({ id, kind, map });
  }
  return out;
}

export function useBlocks(doc: Y.Doc, canEdit: boolean): BlockRef[] {
  const [blocks, setBlocks] = useState<BlockRef[]>(() => read(doc));
  useEffect(() => {
    const arr = blocksOf(doc);
    const onChange = (event: Y.YArrayEvent<BlockMap>) => {
      const list = read(doc);
      if (canEdit && !event.transaction.local && list.length < arr.length) dedupeBlocks(doc);
      setBlocks(list);
    };
    setBlocks(read(doc));
    arr.observe(onChange);
    return () => arr.unobserve(onChange);
  }, [doc, canEdit]);
  return blocks;
}

export type Meta = DocMeta;

export function useMeta(doc: Y.Doc): Meta {
  const [meta, setMeta] = useState<Meta>(() => readMeta(doc));
  useEffect(() => {
    const m = metaOf(doc);
    const onChange = () => setMeta(readMeta(doc));
    onChange();
    m.observe(onChange);
    return () => m.unobserve(onChange);
  }, [doc]);
  return meta;
}
