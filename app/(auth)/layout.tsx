import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/logo-mark";

// Signed-out pages: the mark, one card, and the product's promise in one sentence.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-section">
      <header className="mb-8 flex flex-col items-center gap-3 text-center">
        <Wordmark size={36} />
        <p className="max-w-sm text-sm text-muted">
          Where every joule of a powertrain concept is booked: fuel, electric, and what is lost on the way.
        </p>
      </header>
      <main className="w-full max-w-form">{children}</main>
      <footer className="mt-auto pt-section text-xs text-muted" aria-hidden="true">
        <span className="inline-flex items-center gap-3">
          <span className="inline-flex items-center gap-1.5"><span className="h-2 w-4 rounded-sm bg-fuel" />fuel</span>
          <span className="inline-flex items-center gap-1.5"><span className="h-2 w-4 rounded-sm bg-electric" />electric</span>
          <span className="inline-flex items-center gap-1.5"><span className="h-2 w-4 rounded-sm bg-loss" />losses</span>
        </span>
      </footer>
    </div>
  );
}
