"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import type { Role } from "@/lib/schemas/fields";
import { api, ApiError } from "@/lib/client/api";
import { queryKeys } from "@/lib/client/query-keys";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { FormMessage } from "@/components/ui/form-message";
import { Panel } from "@/components/ui/panel";
import { InviteForm } from "./invite-form";
import { MembersTableContext, type MembersTableActions } from "./members-context";
import { MembersTable } from "./members-table";
import { PendingInvitations } from "./pending-invitations";
import type { MemberRow, MembersResponse } from "./types";

type Props = {
  workspaceId: string;
  workspaceName: string;
  currentUserId: string;
  canManage: boolean;
  readOnlyReason: string;
  initialData?: MembersResponse;
};

export function MembersView({ workspaceId, workspaceName, currentUserId, canManage, readOnlyReason, initialData }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [error, setError] = useState<string>();
  const [removing, setRemoving] = useState<MemberRow>();
  const key = queryKeys.members(workspaceId);
  const query = useQuery({
    queryKey: key,
    queryFn: () => api<MembersResponse>(`/api/workspaces/${workspaceId}/members`),
    initialData,
  });

  const changeRole = useMutation({
    mutationFn: ({ member, role }: { member: MemberRow; role: Role }) =>
      api(`/api/workspaces/${workspaceId}/members/${member.userId}`, "PATCH", { role }),
    onSuccess: async (_data, { member }) => {
      await queryClient.invalidateQueries({ queryKey: key });
      // Demoting yourself changes what this page may show: let the server decide again.
      if (member.userId === currentUserId) router.refresh();
    },
    onError: (e) => setError(messageOf(e)),
  });
  const remove = useMutation({
    mutationFn: (member: MemberRow) => api(`/api/workspaces/${workspaceId}/members/${member.userId}`, "DELETE"),
    onSuccess: async (_data, member) => {
      setRemoving(undefined);
      if (member.userId === currentUserId) return window.location.assign("/");
      await queryClient.invalidateQueries({ queryKey: key });
    },
    onError: (e) => {
      setRemoving(undefined);
      setError(messageOf(e));
    },
  });

  const owners = query.data?.members.filter((m) => m.role === "owner") ?? [];
  const soleOwnerId = owners.length === 1 ? owners[0]!.userId : undefined;
  const actions = useMemo<MembersTableActions>(
    () => ({
      currentUserId,
      soleOwnerId,
      canManage,
      busyUserId: changeRole.isPending ? changeRole.variables?.member.userId : undefined,
      changeRole: (member, role) => {
        setError(undefined);
        changeRole.mutate({ member, role });
      },
      askRemove: (member) => {
        setError(undefined);
        setRemoving(member);
      },
    }),
    [currentUserId, canManage, changeRole, soleOwnerId],
  );

  const self = removing?.userId === currentUserId;
  return (
    <div className="flex flex-col gap-gutter">
      {!canManage ? (
        <p className="rounded-control border border-rule bg-paper-sunk px-4 py-3 text-sm text-ink-soft">{readOnlyReason}</p>
      ) : null}
      <Panel title="Current members" description={query.data ? `${query.data.members.length} in ${workspaceName}` : undefined}>
        <FormMessage error={error} />
        {query.isPending ? (
          <p className="text-sm text-muted" role="status">Loading members…</p>
        ) : query.isError ? (
          <FormMessage error={messageOf(query.error)} />
        ) : (
          <MembersTableContext.Provider value={actions}>
            <MembersTable members={query.data.members} />
          </MembersTableContext.Provider>
        )}
      </Panel>
      {canManage ? (
        <>
          <Panel title="Invite a colleague" description="They get an e-mail with a link that works once and expires.">
            <InviteForm workspaceId={workspaceId} />
          </Panel>
          <Panel title="Pending invitations">
            {query.data ? <PendingInvitations workspaceId={workspaceId} invitations={query.data.invitations} /> : null}
          </Panel>
        </>
      ) : null}
      <ConfirmDialog
        open={removing !== undefined}
        title={self ? `Leave ${workspaceName}?` : `Remove ${removing?.name ?? ""}?`}
        confirmLabel={self ? "Leave workspace" : "Remove member"}
        pending={remove.isPending}
        onCancel={() => setRemoving(undefined)}
        onConfirm={() => removing && remove.mutate(removing)}
      >
        {self
          ? "You lose access to its scenarios, versions and reviews until an owner invites you again."
          : `${removing?.name ?? "They"} (${removing?.email ?? ""}) loses access to this workspace until invited again.`}
      </ConfirmDialog>
    </div>
  );
}

function messageOf(error: unknown): string {
  return error instanceof ApiError ? error.message : "Something went wrong. Try again.";
}
