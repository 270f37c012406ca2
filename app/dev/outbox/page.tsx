import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Wordmark } from "@/components/brand/logo-mark";
import { OutboxList } from "@/components/outbox/outbox-list";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Development outbox" };
// The switch is read when the request arrives, not when the app is built.
export const dynamic = "force-dynamic";

export default function OutboxPage() {
  if (process.env.JOULEBOOK_OUTBOX !== "1") notFound();
  return (
    <main className="mx-auto max-w-3xl px-gutter py-section">
      <div className="mb-6"><Wordmark /></div>
      <PageTitle eyebrow="Development only" title="Outbox">
        <p>Every e-mail the app sent, caught by the local mail sink instead of being delivered. Links open here.</p>
      </PageTitle>
      <OutboxList />
    </main>
  );
}
