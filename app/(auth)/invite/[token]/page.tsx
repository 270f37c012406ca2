import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { InvitationPanel } from "@/components/invite/invitation-panel";
import { getCurrentSession } from "@/lib/auth/server";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const current = await getCurrentSession();
  return (
    <AuthCard title="Invitation to a workspace">
      <InvitationPanel token={token} signedInAs={current?.user.email ?? null} />
    </AuthCard>
  );
}
