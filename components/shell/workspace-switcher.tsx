"use client";
import Link from "next/link";
import { useEffect, useId, useRef, useState, type KeyboardEvent } from "react";

type WorkspaceItem = { id: string; name: string; role: string };

// A disclosure button with a list of links: Enter/Space/ArrowDown open it, arrows move between
// entries, Escape closes it and returns focus to the button.
export function WorkspaceSwitcher({ workspaces, currentId }: { workspaces: WorkspaceItem[]; currentId?: string }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const current = workspaces.find((w) => w.id === currentId);

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener("pointerdown", onPointer);
    rootRef.current?.querySelector<HTMLElement>("[aria-current='true'], a")?.focus();
    return () => document.removeEventListener("pointerdown", onPointer);
  }, [open]);

  const links = () => Array.from(rootRef.current?.querySelectorAll<HTMLAnchorElement>("ul a") ?? []);
  const onMenuKey = (event: KeyboardEvent) => {
    const items = links();
    const index = items.indexOf(document.activeElement as HTMLAnchorElement);
    if (event.key === "Escape") {
      event.preventDefault();
      setOpen(false);
      buttonRef.current?.focus();
    } else if (event.key === "ArrowDown" || event.key === "ArrowUp") {
      event.preventDefault();
      const step = event.key === "ArrowDown" ? 1 : -1;
      items[(index + step + items.length) % items.length]?.focus();
    } else if (event.key === "Home" || event.key === "End") {
      event.preventDefault();
      items[event.key === "Home" ? 0 : items.length - 1]?.focus();
    }
  };

  return (
    <div ref={rootRef} className="relative" onKeyDown={open ? onMenuKey : undefined}>
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        aria-label={`Workspace: ${current?.name ?? "none chosen"}. Switch workspace`}
        onClick={() => setOpen((value) => !value)}
        onKeyDown={(event) => {
          if (event.key === "ArrowDown" && !open) {
            event.preventDefault();
            setOpen(true);
          }
        }}
        className="inline-flex max-w-64 items-center gap-2 rounded-control border border-rule-strong bg-paper-raised px-3 py-1.5 text-sm font-medium hover:bg-paper-sunk"
      >
        <span className="truncate">{current?.name ?? "Choose a workspace"}</span>
        <svg viewBox="0 0 12 12" width="12" height="12" aria-hidden="true" className={open ? "rotate-180" : ""}>
          <path d="M2 4.5 6 8l4-3.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
        </svg>
      </button>
      {open ? (
        <div
          id={menuId}
          className="absolute left-0 z-20 mt-2 w-72 rounded-card border border-rule bg-paper-raised p-1.5 shadow-card"
        >
          <p className="px-3 pb-1 pt-2 text-xs font-medium uppercase tracking-wide text-muted">Your workspaces</p>
          <ul aria-label="Your workspaces">
            {workspaces.map((w) => (
              <li key={w.id}>
                <Link
                  href={`/w/${w.id}`}
                  aria-current={w.id === currentId ? "true" : undefined}
                  onClick={() => setOpen(false)}
                  className="flex items-center justify-between gap-3 rounded-control px-3 py-2 text-sm hover:bg-paper-sunk aria-[current=true]:bg-paper-sunk aria-[current=true]:font-semibold"
                >
                  <span className="truncate">{w.name}</span>
                  <span className="text-xs text-muted">{w.role}</span>
                </Link>
              </li>
            ))}
            <li className="mt-1 border-t border-rule pt-1">
              <Link
                href="/workspaces/new"
                onClick={() => setOpen(false)}
                className="flex items-center gap-2 rounded-control px-3 py-2 text-sm font-medium text-electric hover:bg-paper-sunk"
              >
                <span aria-hidden="true">+</span> New workspace
              </Link>
            </li>
          </ul>
        </div>
      ) : null}
    </div>
  );
}
