import { route } from "@/lib/http/route";
import { chartSpec } from "@/lib/export/charts";
import { renderSvg } from "@/lib/export/render";
import { download, exportSourceFor, type ExportParams } from "@/lib/export/respond";
import { reviewSummaryHtml } from "@/lib/export/review-summary";

// Printable one-page review summary (HTML + print CSS), for the current draft or ?version=<id>.
// No script runs in it: every user string is escaped and the CSP forbids scripts.
export const GET = route<ExportParams>({}, async (ctx) => {
  const src = await exportSourceFor(ctx);
  const chartSvg = await renderSvg(chartSpec("speed", src.result));
  const html = reviewSummaryHtml({ ...src, generatedAt: new Date(), chartSvg });
  const res = download(html, "text/html; charset=utf-8", null);
  res.headers.set("Content-Security-Policy", "default-src 'none'; style-src 'unsafe-inline'; img-src data:; font-src 'self'");
  return res;
});
