"use client";
// Who is in the document and which block each person is on (click to go there).
import { BLOCK_TITLES } from "@/lib/notebook";
import type { Peer } from "@/lib/client/notebook/presence";
import { useNotebook } from "./notebook-context";
import { initials } from "./block-card";
import { jumpToBlock } from "./jump";

export function PresenceBar({ peers }: { peers: Peer[] }) {
  const { blocks } = useNotebook();
  const titleOf = (id: string | null) => {
    const b = id ? blocks.find((x) => x.id === id) : undefined;
    if (!b) return null;
    const t = b.map.get("title");
    return typeof t === "string" ? t : BLOCK_TITLES[b.kind];
  };
  return (
    <ul className="flex flex-wrap items-center gap-2" aria-label="People in this document" data-presence>
      {peers.map((p) => {
        const where = titleOf(p.blockId);
        return (
          <li key={p.clientId} className="flex items-center gap-1.5 rounded-full border border-rule bg-paper-raised py-0.5 pl-0.5 pr-2.5 text-xs">
            <span className="flex size-6 items-center justify-center rounded-full text-[0.65rem] font-semibold text-paper-raised" style={{ backgroundColor: p.user.color }} aria-hidden="true">
              {initials(p.user.name)}
            </span>
            <span className="font-medium">{p.user.name}{p.self ? " (you)" : ""}</span>
            {where && p.blockId ? (
              <button type="button" onClick={() => jumpToBlock(p.blockId!)} className="text-muted underline decoration-rule-strong underline-offset-2 hover:text-ink">
                on {where}
              </button>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
