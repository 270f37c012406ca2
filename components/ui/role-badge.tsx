const roleStyle: Record<string, string> = {
  owner: "bg-ink text-paper-raised",
  editor: "bg-electric-soft text-electric",
  reviewer: "bg-fuel-soft text-fuel",
  viewer: "bg-paper-sunk text-ink-soft",
};

export function RoleBadge({ role }: { role: string }) {
  return (
    <span className={`inline-block rounded-full px-2.5 py-0.5 text-xs font-medium ${roleStyle[role] ?? roleStyle.viewer}`}>
      {role}
    </span>
  );
}
