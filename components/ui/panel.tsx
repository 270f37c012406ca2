import type { ReactNode } from "react";

// A card on the paper: used for forms, summaries and tables.
export function Panel({
  title,
  description,
  children,
  className = "",
  headingLevel = 2,
  actions,
}: {
  title?: string;
  description?: ReactNode;
  children: ReactNode;
  className?: string;
  headingLevel?: 2 | 3;
  actions?: ReactNode;
}) {
  const Heading = headingLevel === 2 ? "h2" : "h3";
  return (
    <section className={`rounded-card border border-rule bg-paper-raised p-gutter shadow-card ${className}`}>
      {title ? (
        <header className="mb-4 flex flex-wrap items-start justify-between gap-3">
          <div>
            <Heading className="text-base font-semibold">{title}</Heading>
            {description ? <p className="mt-1 text-sm text-muted">{description}</p> : null}
          </div>
          {actions}
        </header>
      ) : null}
      {children}
    </section>
  );
}
