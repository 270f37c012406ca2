import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard, linkClass } from "@/components/auth/auth-card";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { FormMessage } from "@/components/ui/form-message";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const token = (await searchParams).token;
  return (
    <AuthCard
      title="Choose a new password"
      footer={<Link className={linkClass} href="/forgot-password">Ask for a new link</Link>}
    >
      {typeof token === "string" && token.length > 0 ? (
        <ResetPasswordForm token={token} />
      ) : (
        <FormMessage error="This page needs the link from the reset e-mail. Open the link from the message, or ask for a new one." />
      )}
    </AuthCard>
  );
}
