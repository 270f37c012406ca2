"use client";
import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import { ROLES, type Role } from "@/lib/schemas/fields";
import { RoleBadge } from "@/components/ui/role-badge";
import { useMembersTable } from "./members-context";
import { ROLE_OPTIONS, type MemberRow } from "./types";

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, MemberRow>();

function NameCell({ member }: { member: MemberRow }) {
  const { currentUserId } = useMembersTable();
  return (
    <span className="font-medium">
      {member.name}
      {member.userId === currentUserId ? <span className="ml-2 text-xs font-normal text-muted">(you)</span> : null}
    </span>
  );
}

function RoleCell({ member }: { member: MemberRow }) {
  const { canManage, changeRole, busyUserId } = useMembersTable();
  if (!canManage) return <RoleBadge role={member.role} />;
  return (
    <select
      aria-label={`Role of ${member.name}`}
      value={member.role}
      disabled={busyUserId === member.userId}
      onChange={(event) => {
        const role = ROLES.find((r) => r === event.target.value);
        if (role) changeRole(member, role as Role);
      }}
      className="select border-rule-strong py-1 pl-2.5 text-sm"
    >
      {ROLE_OPTIONS.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </select>
  );
}

function ActionsCell({ member }: { member: MemberRow }) {
  const { canManage, currentUserId, askRemove, busyUserId, soleOwnerId } = useMembersTable();
  const self = member.userId === currentUserId;
  if (!canManage && !self) return null;
  // The last owner cannot leave (the server refuses too); say so instead of offering a dead button.
  if (member.userId === soleOwnerId) return <span className="text-xs text-muted">last owner</span>;
  return (
    <button
      type="button"
      onClick={() => askRemove(member)}
      disabled={busyUserId === member.userId}
      className="rounded-control px-2 py-1 text-sm font-medium text-danger hover:bg-danger-soft disabled:opacity-50"
    >
      {self ? "Leave" : "Remove"}
      <span className="sr-only"> {self ? "this workspace" : member.name}</span>
    </button>
  );
}

const columns = helper.columns([
  helper.accessor("name", { header: "Name", cell: (info) => <NameCell member={info.row.original} /> }),
  helper.accessor("email", { header: "E-mail", cell: (info) => <span className="text-ink-soft">{info.getValue()}</span> }),
  helper.accessor("role", { header: "Role", cell: (info) => <RoleCell member={info.row.original} /> }),
  helper.display({ id: "actions", header: () => <span className="sr-only">Actions</span>, cell: (info) => <ActionsCell member={info.row.original} /> }),
]);

export function MembersTable({ members }: { members: MemberRow[] }) {
  const table = useTable({ features, columns, data: members, getRowId: (row) => row.userId });
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Members of this workspace</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule-strong">
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-cell py-3 text-xs font-semibold uppercase tracking-wide text-muted">
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule last:border-b-0 hover:bg-paper-sunk/50">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className={`px-cell py-3.5 ${cell.column.id === "actions" ? "text-right" : ""}`}>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
