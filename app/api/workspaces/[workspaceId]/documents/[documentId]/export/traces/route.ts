import { route } from "@/lib/http/route";
import { fileStem } from "@/lib/export/filename";
import { download, exportSourceFor, type ExportParams } from "@/lib/export/respond";
import { tracesCsv } from "@/lib/export/traces-csv";

// Traces of the current draft or of ?version=<id>, one row per interval.
export const GET = route<ExportParams>({}, async (ctx) => {
  const src = await exportSourceFor(ctx);
  return download(tracesCsv(src.result), "text/csv; charset=utf-8", `${fileStem(src.title)}-traces.csv`);
});
