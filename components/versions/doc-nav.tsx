// Links between a document's notebook, versions, comparison and reviews pages.
import Link from "next/link";

const TABS = [
  { key: "notebook", label: "Notebook", path: "" },
  { key: "versions", label: "Versions", path: "/versions" },
  { key: "reviews", label: "Reviews", path: "/reviews" },
] as const;

export function DocNav({ workspaceId, documentId, name, current }: { workspaceId: string; documentId: string; name: string; current: "notebook" | "versions" | "reviews" | "diff" }) {
  const base = `/w/${workspaceId}/documents/${documentId}`;
  return (
    <nav aria-label="Document" className="mb-4 flex flex-wrap items-center gap-1 text-sm">
      <span className="mr-2 font-semibold">{name}</span>
      {TABS.map((t) => (
        <Link key={t.key} href={base + t.path} aria-current={current === t.key ? "page" : undefined}
          className={`rounded-control px-3 py-1 ${current === t.key ? "bg-ink text-paper-raised" : "hover:bg-paper-sunk"}`}>
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
