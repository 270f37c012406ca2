"use client";
// Keeps the previous object for every key whose content did not change (compared as JSON), so
// memoised blocks re-render only when their own messages, values or peers changed.
import { useRef } from "react";

export function useStableEntries<T>(next: Map<string, T>): Map<string, T> {
  const previous = useRef(new Map<string, { json: string; value: T }>());
  const out = new Map<string, T>();
  const kept = new Map<string, { json: string; value: T }>();
  for (const [key, value] of next) {
    const json = JSON.stringify(value);
    const old = previous.current.get(key);
    const entry = old && old.json === json ? old : { json, value };
    kept.set(key, entry);
    out.set(key, entry.value);
  }
  previous.current = kept;
  return out;
}
