"use client";
// Title and collapsed flag of one block map, re-rendered only when those keys change.
import { useEffect, useState } from "react";
import * as Y from "yjs";
import { BLOCK_TITLES, type BlockMap, type BlockKind } from "@/lib/notebook";

export interface BlockProps {
  title: string;
  collapsed: boolean;
}

function read(map: BlockMap, kind: BlockKind): BlockProps {
  const title = map.get("title");
  return { title: typeof title === "string" ? title : BLOCK_TITLES[kind], collapsed: map.get("collapsed") === true };
}

export function useBlockProps(map: BlockMap, kind: BlockKind): BlockProps {
  const [props, setProps] = useState(() => read(map, kind));
  useEffect(() => {
    const onChange = (event: Y.YMapEvent<unknown>) => {
      if (event.keysChanged.has("title") || event.keysChanged.has("collapsed")) setProps(read(map, kind));
    };
    setProps(read(map, kind));
    map.observe(onChange);
    return () => map.unobserve(onChange);
  }, [map, kind]);
  return props;
}

/** The Y.Text of a field, created on first use by editors (missing keys read as empty). */
export function paramText(map: BlockMap, key: string): Y.Text | undefined {
  const params = map.get("params");
  if (!(params instanceof Y.Map)) return undefined;
  const text = params.get(key);
  return text instanceof Y.Text ? text : undefined;
}

export function ensureParamText(map: BlockMap, key: string): Y.Text | undefined {
  const existing = paramText(map, key);
  if (existing) return existing;
  const params = map.get("params");
  if (!(params instanceof Y.Map) || !map.doc) return undefined;
  const text = new Y.Text("");
  map.doc.transact(() => params.set(key, text));
  return text;
}
