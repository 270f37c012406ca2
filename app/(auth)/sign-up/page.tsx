import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard, linkClass } from "@/components/auth/auth-card";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { getCurrentSession } from "@/lib/auth/server";
import { safeNext, withNext } from "@/lib/client/safe-next";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const next = safeNext(params.next);
  if (await getCurrentSession()) redirect(next);
  const email = typeof params.email === "string" ? params.email : "";
  return (
    <AuthCard
      title="Create an account"
      lead="One account for every workspace you are invited to."
      footer={
        <p>
          Already have an account? <Link className={linkClass} href={withNext("/sign-in", next)}>Sign in</Link>
        </p>
      }
    >
      <SignUpForm next={next} email={email} />
    </AuthCard>
  );
}
