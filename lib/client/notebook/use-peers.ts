"use client";
import { useEffect, useState } from "react";
import type { Awareness } from "y-protocols/awareness";
import { readPeers, type Peer } from "./presence";

/** Everyone present in the document, re-read on every awareness change. */
export function usePeers(awareness: Awareness): Peer[] {
  const [peers, setPeers] = useState<Peer[]>(() => readPeers(awareness));
  useEffect(() => {
    const onChange = () => setPeers(readPeers(awareness));
    onChange();
    awareness.on("change", onChange);
    return () => awareness.off("change", onChange);
  }, [awareness]);
  return peers;
}
