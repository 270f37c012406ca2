import type { ReactNode } from "react";

export function AuthCard({ title, lead, children, footer }: { title: string; lead?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="rounded-card border border-rule bg-paper-raised p-gutter shadow-card">
      <h1 className="text-xl font-semibold">{title}</h1>
      {lead ? <p className="mt-1 text-sm text-muted">{lead}</p> : null}
      <div className="mt-6">{children}</div>
      {footer ? <div className="mt-6 border-t border-rule pt-4 text-sm text-muted">{footer}</div> : null}
    </div>
  );
}

export const linkClass = "font-medium text-electric underline decoration-electric/40 underline-offset-2 hover:decoration-electric";
