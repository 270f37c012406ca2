import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard, linkClass } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/sign-in-form";
import { getCurrentSession } from "@/lib/auth/server";
import { safeNext, withNext } from "@/lib/client/safe-next";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const next = safeNext((await searchParams).next);
  if (await getCurrentSession()) redirect(next);
  return (
    <AuthCard
      title="Sign in"
      lead="Open your team's scenarios and reviews."
      footer={
        <div className="flex flex-col gap-2">
          <p>
            New here? <Link className={linkClass} href={withNext("/sign-up", next)}>Create an account</Link>
          </p>
          <p>
            <Link className={linkClass} href="/forgot-password">Forgot your password?</Link>
          </p>
        </div>
      }
    >
      <SignInForm next={next} />
    </AuthCard>
  );
}
