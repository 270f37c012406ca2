import { route } from "@/lib/http/route";
import { exportBundle } from "@/lib/export/bundle";
import { fileStem } from "@/lib/export/filename";
import { download, exportSourceFor, type ExportParams } from "@/lib/export/respond";

// Scenario + Result as one JSON file; the Scenario part runs again with `npm run evaluate`.
export const GET = route<ExportParams>({}, async (ctx) => {
  const src = await exportSourceFor(ctx);
  const bundle = exportBundle({
    source: { workspace_id: ctx.params.workspaceId, document_id: ctx.params.documentId, version_id: src.versionId, title: src.title },
    scenario: src.scenario, result: src.result,
  });
  return download(JSON.stringify(bundle, null, 1), "application/json; charset=utf-8", `${fileStem(src.title)}-scenario-result.json`);
});
