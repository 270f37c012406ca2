"use client";
// "Add block": a menu of block kinds, grouped.
import { useEffect, useRef, useState } from "react";
import { BLOCK_TITLES, insertBlock, type BlockKind } from "@/lib/notebook";
import { Button } from "@/components/ui/button";
import { useNotebook } from "./notebook-context";
import { jumpToBlock } from "./jump";

const GROUPS: { title: string; kinds: BlockKind[] }[] = [
  { title: "Scenario", kinds: ["drive_cycle", "body", "driveline", "engine", "electric_machine", "generator_set", "battery_pack", "energy_manager"] },
  { title: "Working notes", kinds: ["parameters", "note"] },
  { title: "Results", kinds: ["headline_figures", "loss_ledger", "energy_flow", "traces", "operating_points", "strategy_comparison"] },
];

export function AddBlockMenu({ index }: { index?: number }) {
  const { doc, step } = useNotebook();
  const [open, setOpen] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open) return;
    const close = (event: MouseEvent) => { if (!root.current?.contains(event.target as Node)) setOpen(false); };
    const onKey = (event: KeyboardEvent) => { if (event.key === "Escape") setOpen(false); };
    document.addEventListener("mousedown", close);
    document.addEventListener("keydown", onKey);
    return () => { document.removeEventListener("mousedown", close); document.removeEventListener("keydown", onKey); };
  }, [open]);
  const add = (kind: BlockKind) => {
    let id = "";
    step(() => { id = insertBlock(doc, kind, index); });
    setOpen(false);
    requestAnimationFrame(() => jumpToBlock(id));
  };
  return (
    <div ref={root} className="relative">
      <Button variant="secondary" aria-expanded={open} aria-haspopup="menu" onClick={() => setOpen((o) => !o)}>+ Add block</Button>
      {open ? (
        <div role="menu" aria-label="Block kinds" className="absolute left-0 z-20 mt-1 grid w-[34rem] max-w-[90vw] grid-cols-3 gap-3 rounded-card border border-rule bg-paper-raised p-3 shadow-card">
          {GROUPS.map((g) => (
            <div key={g.title}>
              <p className="mb-1 px-2 text-xs font-semibold uppercase tracking-wide text-muted">{g.title}</p>
              {g.kinds.map((k) => (
                <button key={k} type="button" role="menuitem" onClick={() => add(k)} className="block w-full rounded-control px-2 py-1 text-left text-sm hover:bg-paper-sunk">
                  {BLOCK_TITLES[k]}
                </button>
              ))}
            </div>
          ))}
        </div>
      ) : null}
    </div>
  );
}
