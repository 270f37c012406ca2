import { route } from "@/lib/http/route";
import { NotFound } from "@/lib/http/errors";
import { chartSpec, EXPORT_CHARTS, type ExportChart } from "@/lib/export/charts";
import { fileStem } from "@/lib/export/filename";
import { renderSvg, svgToPng } from "@/lib/export/render";
import { download, exportSourceFor, type ExportParams } from "@/lib/export/respond";

// /export/charts/speed.svg, /export/charts/ledger.png … rendered on the server.
export const GET = route<ExportParams & { chart: string }>({}, async (ctx) => {
  const m = ctx.params.chart.match(/^([a-z]+)\.(svg|png)$/);
  if (!m || !(EXPORT_CHARTS as readonly string[]).includes(m[1]))
    throw new NotFound(`no such chart; choose one of ${EXPORT_CHARTS.flatMap((c) => [`${c}.svg`, `${c}.png`]).join(", ")}`);
  const src = await exportSourceFor(ctx);
  const svg = await renderSvg(chartSpec(m[1] as ExportChart, src.result));
  const name = `${fileStem(src.title)}-${m[1]}.${m[2]}`;
  return m[2] === "svg" ? download(svg, "image/svg+xml; charset=utf-8", name) : download(new Uint8Array(svgToPng(svg)), "image/png", name);
});
