import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard, linkClass } from "@/components/auth/auth-card";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata: Metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <AuthCard
      title="Reset your password"
      lead="We will e-mail you a link that sets a new password. It works once."
      footer={<Link className={linkClass} href="/sign-in">Back to sign-in</Link>}
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
