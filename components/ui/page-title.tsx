import type { ReactNode } from "react";

export function PageTitle({ eyebrow, title, children }: { eyebrow?: ReactNode; title: string; children?: ReactNode }) {
  return (
    <div className="mb-8">
      {eyebrow ? <p className="mb-1 text-sm text-muted">{eyebrow}</p> : null}
      <h1 className="text-2xl font-semibold">{title}</h1>
      {children ? <div className="mt-2 max-w-2xl text-sm text-ink-soft">{children}</div> : null}
    </div>
  );
}
