import Link from "next/link";
import { Wordmark } from "@/components/brand/logo-mark";
import { linkClass } from "@/components/auth/auth-card";

// Also what non-members see for a workspace: it does not say whether the workspace exists.
export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-form flex-col items-center justify-center gap-6 px-gutter text-center">
      <Wordmark size={36} />
      <div>
        <h1 className="text-xl font-semibold">Nothing here</h1>
        <p className="mt-2 text-sm text-ink-soft">
          This page does not exist, or you are not a member of the workspace it belongs to. If someone invited you, open the link from
          their e-mail.
        </p>
      </div>
      <Link href="/" className={linkClass}>
        Go to your workspaces
      </Link>
    </main>
  );
}
