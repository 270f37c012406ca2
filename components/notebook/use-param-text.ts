"use client";
// The Y.Text of one field of a block, following replacements of the key (a remote person may
// create it first), and the block's current choice values (for fields shown only for a choice).
import { useEffect, useState } from "react";
import * as Y from "yjs";
import type { BlockMap } from "@/lib/notebook";

export function paramsOf(map: BlockMap): Y.Map<Y.Text> | null {
  const params = map.get("params");
  return params instanceof Y.Map ? (params as Y.Map<Y.Text>) : null;
}

export function useParamText(map: BlockMap, key: string): Y.Text | null {
  const read = () => {
    const t = paramsOf(map)?.get(key);
    return t instanceof Y.Text ? t : null;
  };
  const [text, setText] = useState<Y.Text | null>(read);
  useEffect(() => {
    const params = paramsOf(map);
    setText(read());
    if (!params) return;
    const onChange = (event: Y.YMapEvent<Y.Text>) => { if (event.keysChanged.has(key)) setText(read()); };
    params.observe(onChange);
    return () => params.unobserve(onChange);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [map, key]);
  return text;
}

/** The text of a few keys (choice fields), re-rendering only when one of them changes. */
export function useParamValues(map: BlockMap, keys: readonly string[]): Record<string, string> {
  const joined = keys.join("\u0000");
  const read = (): Record<string, string> => {
    const params = paramsOf(map);
    const out: Record<string, string> = {};
    for (const k of keys) { const t = params?.get(k); if (t instanceof Y.Text) out[k] = t.toString(); }
    return out;
  };
  const [values, setValues] = useState(read);
  useEffect(() => {
    const params = paramsOf(map);
    if (!params || keys.length === 0) return;
    let last = JSON.stringify(read());
    setValues(read());
    const onChange = () => {
      const next = read();
      const s = JSON.stringify(next);
      if (s !== last) { last = s; setValues(next); }
    };
    params.observeDeep(onChange);
    return () => params.unobserveDeep(onChange);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [map, joined]);
  return values;
}

/** Names of a Parameters block, in insertion order of the map, re-read when keys change. */
export function useParamNames(map: BlockMap): string[] {
  const read = () => Array.from(paramsOf(map)?.keys() ?? []);
  const [names, setNames] = useState<string[]>(read);
  useEffect(() => {
    const params = paramsOf(map);
    setNames(read());
    if (!params) return;
    const onChange = () => setNames(read());
    params.observe(onChange);
    return () => params.unobserve(onChange);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [map]);
  return names;
}

/** The current content of a Y.Text (or "" without one), re-rendering on every change, local or remote. */
export function useTextValue(text: Y.Text | null): string {
  const [value, setValue] = useState(() => text?.toString() ?? "");
  useEffect(() => {
    setValue(text?.toString() ?? "");
    if (!text) return;
    const onChange = () => setValue(text.toString());
    text.observe(onChange);
    return () => text.unobserve(onChange);
  }, [text]);
  return value;
}
