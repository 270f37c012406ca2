"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { api, ApiError } from "@/lib/client/api";
import { queryKeys } from "@/lib/client/query-keys";
import { FormMessage } from "@/components/ui/form-message";
import { RoleBadge } from "@/components/ui/role-badge";
import type { InvitationRow } from "./types";

// "2026-12-08 23:00": built by hand so that the server and the browser print the same text
// (their ICU data may differ, which would break hydration).
function utcMinute(iso: string): string {
  return new Date(iso).toISOString().slice(0, 16).replace("T", " ");
}

export function PendingInvitations({ workspaceId, invitations }: { workspaceId: string; invitations: InvitationRow[] }) {
  const queryClient = useQueryClient();
  const [error, setError] = useState<string>();
  const revoke = useMutation({
    mutationFn: (id: string) => api(`/api/workspaces/${workspaceId}/invitations/${id}`, "DELETE"),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.members(workspaceId) }),
    onError: (e) => setError(e instanceof ApiError ? e.message : "Could not revoke the invitation."),
  });
  if (invitations.length === 0) return <p className="text-sm text-muted">No invitations waiting for an answer.</p>;
  return (
    <div className="flex flex-col gap-3">
      <FormMessage error={error} />
      <div className="relative overflow-x-auto">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Pending invitations</caption>
          <thead>
            <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
              <th scope="col" className="px-cell py-3 font-semibold">E-mail</th>
              <th scope="col" className="px-cell py-3 font-semibold">Role</th>
              <th scope="col" className="px-cell py-3 font-semibold">Expires (UTC)</th>
              <th scope="col" className="px-cell py-3"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {invitations.map((inv) => (
              <tr key={inv.id} className="border-b border-rule last:border-b-0">
                <td className="px-cell py-3.5">{inv.email}</td>
                <td className="px-cell py-3.5"><RoleBadge role={inv.role} /></td>
                <td className="num whitespace-nowrap px-cell py-3.5 text-ink-soft">{utcMinute(inv.expiresAt)}</td>
                <td className="px-cell py-3.5 text-right">
                  <button
                    type="button"
                    onClick={() => {
                      setError(undefined);
                      revoke.mutate(inv.id);
                    }}
                    disabled={revoke.isPending && revoke.variables === inv.id}
                    className="rounded-control px-2 py-1 text-sm font-medium text-danger hover:bg-danger-soft disabled:opacity-50"
                  >
                    Revoke<span className="sr-only"> the invitation for {inv.email}</span>
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
