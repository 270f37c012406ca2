"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/client/api";
import { queryKeys } from "@/lib/client/query-keys";
import { withNext } from "@/lib/client/safe-next";
import { Button, ButtonLink } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { RoleBadge } from "@/components/ui/role-badge";

type Invitation = { workspaceName: string; role: string; email: string; inviter: unknown };

function inviterName(inviter: unknown): string | null {
  if (typeof inviter === "string" && inviter.length > 0) return inviter;
  if (inviter && typeof inviter === "object" && "name" in inviter && typeof inviter.name === "string") return inviter.name;
  return null;
}

export function InvitationPanel({ token, signedInAs }: { token: string; signedInAs: string | null }) {
  const invitation = useQuery({
    queryKey: queryKeys.invitation(token),
    queryFn: () => api<Invitation>(`/api/invitations/${encodeURIComponent(token)}`),
  });
  const accept = useMutation({
    mutationFn: () => api<{ workspaceId: string }>(`/api/invitations/${encodeURIComponent(token)}/accept`, "POST"),
    // A full load: the workspace list in the header must include the new membership.
    onSuccess: ({ workspaceId }) => window.location.assign(`/w/${workspaceId}`),
  });

  if (invitation.isPending) return <p role="status" className="text-sm text-muted">Looking up the invitation…</p>;
  if (invitation.isError) return <FormMessage error={invalidMessage(invitation.error)} />;

  const data = invitation.data;
  const here = `/invite/${token}`;
  const from = inviterName(data.inviter);
  return (
    <div className="flex flex-col gap-5">
      <p className="text-ink-soft">
        {from ? <><span className="font-medium text-ink">{from}</span> invites you</> : "You are invited"} to join{" "}
        <span className="font-semibold text-ink">{data.workspaceName}</span> as <RoleBadge role={data.role} />.
      </p>
      <p className="text-sm text-muted">The invitation was sent to {data.email}.</p>
      {signedInAs ? (
        <>
          <FormMessage error={accept.isError ? invalidMessage(accept.error) : undefined} />
          {signedInAs.toLowerCase() !== data.email.toLowerCase() ? (
            <p className="rounded-control border border-warn/40 bg-warn-soft px-3 py-2 text-sm text-warn">
              You are signed in as {signedInAs}, not as {data.email}.
            </p>
          ) : null}
          <Button onClick={() => accept.mutate()} disabled={accept.isPending || accept.isSuccess}>
            {accept.isPending ? "Joining…" : `Accept and open ${data.workspaceName}`}
          </Button>
        </>
      ) : (
        <div className="flex flex-col gap-3 border-t border-rule pt-4">
          <p className="text-sm font-medium">Sign in or create an account first; you come back here to accept.</p>
          <div className="flex flex-wrap gap-3">
            <ButtonLink href={`${withNext("/sign-up", here)}&email=${encodeURIComponent(data.email)}`}>Create an account</ButtonLink>
            <ButtonLink variant="secondary" href={withNext("/sign-in", here)}>Sign in</ButtonLink>
          </div>
        </div>
      )}
    </div>
  );
}

function invalidMessage(error: unknown): string {
  if (error instanceof ApiError && error.status === 404) return "This invitation link is not valid. Ask the workspace owner for a new one.";
  if (error instanceof ApiError && error.status === 410) return "This invitation has expired or has already been used. Ask the workspace owner for a new one.";
  if (error instanceof ApiError) return error.message.charAt(0).toUpperCase() + error.message.slice(1);
  return "Something went wrong. Try again.";
}
