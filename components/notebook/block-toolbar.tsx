"use client";
// Per-block commands: move up/down, duplicate, collapse, delete. Alt+↑/↓ on the block moves it.
import type { ReactNode } from "react";

function ToolButton({ label, onClick, disabled, children }: { label: string; onClick: () => void; disabled?: boolean; children: ReactNode }) {
  return (
    <button type="button" aria-label={label} title={label} onClick={onClick} disabled={disabled}
      className="inline-flex size-7 items-center justify-center rounded-control text-ink-soft hover:bg-paper-sunk hover:text-ink disabled:opacity-30 disabled:hover:bg-transparent">
      {children}
    </button>
  );
}

const icon = (d: string) => (
  <svg viewBox="0 0 16 16" className="size-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true"><path d={d} /></svg>
);

export function BlockToolbar(props: {
  title: string; collapsed: boolean; canEdit: boolean; first: boolean; last: boolean;
  onUp: () => void; onDown: () => void; onDuplicate: () => void; onToggle: () => void; onDelete: () => void;
}) {
  const { title, collapsed, canEdit, first, last } = props;
  return (
    <div className="flex items-center gap-0.5">
      {canEdit ? (
        <>
          <ToolButton label={`Move ${title} up`} onClick={props.onUp} disabled={first}>{icon("M8 13V3M4 7l4-4 4 4")}</ToolButton>
          <ToolButton label={`Move ${title} down`} onClick={props.onDown} disabled={last}>{icon("M8 3v10M4 9l4 4 4-4")}</ToolButton>
          <ToolButton label={`Duplicate ${title}`} onClick={props.onDuplicate}>{icon("M5 5h8v8H5zM3 11V3h8")}</ToolButton>
        </>
      ) : null}
      <ToolButton label={`${collapsed ? "Expand" : "Collapse"} ${title}`} onClick={props.onToggle}>
        {icon(collapsed ? "M4 6l4 4 4-4" : "M4 10l4-4 4 4")}
      </ToolButton>
      {canEdit ? <ToolButton label={`Delete ${title}`} onClick={props.onDelete}>{icon("M3 4h10M6 4V2.5h4V4M4.5 4l.7 9h5.6l.7-9")}</ToolButton> : null}
    </div>
  );
}
