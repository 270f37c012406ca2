"use client";
// Create (shown once), list and revoke personal API tokens.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { api, ApiError } from "@/lib/client/api";

export type TokenRow = {
  id: string; name: string; prefix: string; role: string; workspaceId: string; workspaceName: string;
  createdAt: string; lastUsedAt: string | null; revokedAt: string | null;
};

const RANK = ["viewer", "reviewer", "editor", "owner"];
const when = (s: string | null) => (s ? new Date(s).toLocaleString("en-GB") : "never");

export function TokensView({ workspaces, initial }: { workspaces: { id: string; name: string; role: string }[]; initial: TokenRow[] }) {
  const [rows, setRows] = useState(initial);
  const [workspaceId, setWorkspaceId] = useState(workspaces[0]?.id ?? "");
  const [name, setName] = useState("");
  const [role, setRole] = useState("viewer");
  const [fresh, setFresh] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const ceiling = workspaces.find((w) => w.id === workspaceId)?.role ?? "viewer";
  const roles = RANK.slice(0, RANK.indexOf(ceiling) + 1);

  const reload = async () => setRows((await api<{ tokens: TokenRow[] }>("/api/tokens")).tokens);

  async function create() {
    setError(null);
    try {
      const out = await api<{ token: string }>("/api/tokens", "POST", { workspaceId, name, role: roles.includes(role) ? role : "viewer" });
      setFresh(out.token);
      setName("");
      await reload();
    } catch (e) {
      setError(e instanceof ApiError ? Object.values(e.fields)[0] ?? e.message : "Creating the token failed.");
    }
  }

  async function revoke(id: string) {
    if (!window.confirm("Revoke this token? Scripts using it stop working at once.")) return;
    try {
      await api(`/api/tokens/${id}`, "DELETE");
      await reload();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : "Revoking failed.");
    }
  }

  return (
    <div className="grid gap-5">
      {workspaces.length === 0 ? <p className="text-sm text-muted">Join or create a workspace first: a token belongs to one workspace.</p> : (
        <div className="grid items-end gap-3 sm:grid-cols-4">
          <label className="flex flex-col gap-1 text-sm"><span className="font-medium">Workspace</span>
            <select className="select py-2 pl-3 border-rule-strong" value={workspaceId} onChange={(e) => setWorkspaceId(e.target.value)}>
              {workspaces.map((w) => <option key={w.id} value={w.id}>{w.name} ({w.role})</option>)}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm"><span className="font-medium">Role</span>
            <select className="select py-2 pl-3 border-rule-strong" value={roles.includes(role) ? role : "viewer"} onChange={(e) => setRole(e.target.value)}>
              {roles.map((r) => <option key={r} value={r}>{r}</option>)}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm"><span className="font-medium">Name</span>
            <input className="rounded-control border border-rule-strong px-3 py-2" value={name} onChange={(e) => setName(e.target.value)} placeholder="nightly sweep" maxLength={100} />
          </label>
          <Button onClick={() => void create()} disabled={name.trim() === "" || !workspaceId}>Create token</Button>
        </div>
      )}
      {error ? <p role="alert" className="text-sm text-danger">{error}</p> : null}
      {fresh ? (
        <div role="status" className="rounded-control border border-electric bg-electric-soft p-3 text-sm">
          <p className="font-medium">Copy this token now: it is not shown again.</p>
          <code className="mt-1 block break-all font-mono" data-testid="new-token">{fresh}</code>
        </div>
      ) : null}
      {rows.length === 0 ? <p className="text-sm text-muted">No tokens yet.</p> : (
        <table className="w-full text-sm">
          <thead className="text-left text-muted"><tr><th className="py-2 pr-3">Name</th><th className="pr-3">Workspace</th><th className="pr-3">Role</th><th className="pr-3">Created</th><th className="pr-3">Last used</th><th /></tr></thead>
          <tbody>
            {rows.map((t) => (
              <tr key={t.id} className="border-t border-rule">
                <td className="py-2 pr-3">{t.name} <span className="font-mono text-xs text-muted">{t.prefix}…</span></td>
                <td className="pr-3">{t.workspaceName}</td>
                <td className="pr-3">{t.role}</td>
                <td className="pr-3">{when(t.createdAt)}</td>
                <td className="pr-3">{when(t.lastUsedAt)}</td>
                <td>{t.revokedAt ? <span className="text-muted">revoked {when(t.revokedAt)}</span> : <Button variant="danger" className="px-2 py-1 text-xs" onClick={() => void revoke(t.id)}>Revoke</Button>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
