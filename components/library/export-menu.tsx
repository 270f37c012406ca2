// Downloads of a document (current draft, or a saved version with `versionId`): traces CSV,
// Scenario + Result JSON, charts as SVG/PNG rendered on the server, the printable review summary.
// Plain links: the browser sends the session cookie; nothing runs on the client.
const CHARTS: [string, string][] = [["speed", "Speed"], ["power", "Power"], ["soc", "State of charge"], ["ledger", "Loss ledger"]];

export function ExportMenu({ workspaceId, documentId, versionId }: { workspaceId: string; documentId: string; versionId?: string }) {
  const base = `/api/workspaces/${encodeURIComponent(workspaceId)}/documents/${encodeURIComponent(documentId)}/export`;
  const q = versionId ? `?version=${encodeURIComponent(versionId)}` : "";
  const link = "block rounded-control px-2 py-1 hover:bg-paper-sunk";
  return (
    <details className="relative mb-3 inline-block text-sm" data-export-menu>
      <summary className="cursor-pointer rounded-control border border-rule-strong bg-paper-raised px-3 py-1.5 font-medium">
        Export{versionId ? " this version" : ""}
      </summary>
      <div className="absolute z-20 mt-1 grid w-72 gap-0.5 rounded-card border border-rule bg-paper-raised p-2 shadow-card">
        <a className={link} href={`${base}/summary${q}`} target="_blank" rel="noopener">Review summary (printable page)</a>
        <a className={link} href={`${base}/traces${q}`}>Traces (CSV)</a>
        <a className={link} href={`${base}/json${q}`}>Scenario + result (JSON)</a>
        {CHARTS.map(([id, label]) => (
          <span key={id} className="flex items-center justify-between px-2 py-1">
            <span>{label} chart</span>
            <span className="flex gap-2">
              <a className="underline" href={`${base}/charts/${id}.svg${q}`}>SVG</a>
              <a className="underline" href={`${base}/charts/${id}.png${q}`}>PNG</a>
            </span>
          </span>
        ))}
        <p className="px-2 pt-1 text-xs text-muted">The current draft is calculated again on the server; figures match the page once it has saved.</p>
      </div>
    </details>
  );
}
