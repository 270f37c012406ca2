import { readFileSync } from "node:fs";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { evaluateScenarioInput, SINK_KEYS, type Result } from "@/lib/engine";
import { tracesCsv } from "@/lib/export/traces-csv";
import { chartSpec } from "@/lib/export/charts";
import { Resvg } from "@resvg/resvg-js";
import { renderSvg, svgToPng } from "@/lib/export/render";
import { reviewSummaryHtml, CAUTIONS } from "@/lib/export/review-summary";
import { exportBundle } from "@/lib/export/bundle";

function evaluated(name: string): { scenario: unknown; result: Result } {
  const scenario = JSON.parse(readFileSync(new URL(`../../../examples/${name}.json`, import.meta.url), "utf8"));
  const r = evaluateScenarioInput(scenario);
  if (!r.ok) throw new Error("example failed");
  return { scenario, result: r.result };
}

describe("exports", () => {
  const { scenario, result } = evaluated("parallel");

  it("traces CSV re-reads to exactly the same numbers (shortest round-trip form)", () => {
    const csv = tracesCsv(result);
    const parsed = Papa.parse<string[]>(csv, { comments: "#", skipEmptyLines: true });
    const [header, ...rows] = parsed.data;
    expect(header.slice(0, 3)).toEqual(["time [s]", "speed [km/h]", "gear [-]"]);
    expect(rows).toHaveLength(result.traces.time_s.length);
    const socCol = header.indexOf("SOC [-]");
    rows.forEach((row, k) => {
      expect(Number(row[0])).toBe(result.traces.time_s[k]);
      expect(Number(row[socCol])).toBe(result.traces.soc[k]);
    });
  });

  it("the JSON bundle carries the Scenario, which evaluates again to the same KPIs", () => {
    const b = JSON.parse(JSON.stringify(exportBundle({ source: { workspace_id: "w", document_id: "d", version_id: null, title: "t" }, scenario, result, now: new Date(0) })));
    expect(b.format).toBe("joulebook.export/1");
    expect(b.exported_at).toBe("1970-01-01T00:00:00.000Z");
    const again = evaluateScenarioInput(b.scenario);
    expect(again.ok && again.result.kpi).toEqual(result.kpi);
  });

  it("renders a chart to SVG on the server and to PNG at twice its size", async () => {
    const svg = await renderSvg(chartSpec("speed", result));
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain("speed (km/h)");
    const width = Number(svg.match(/width="(\d+(?:\.\d+)?)"/)![1]);
    const png = svgToPng(svg, 2);
    // PNG signature (ISO/IEC 15948 §5.2) and IHDR width, big-endian at byte 16
    expect([...png.slice(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    const ihdrWidth = new DataView(png.buffer, png.byteOffset).getUint32(16);
    expect(ihdrWidth).toBe(Math.round(width * 2));
  });

  it("PNG text is drawn with the shipped Inter, without any system font", async () => {
    const svg = await renderSvg(chartSpec("speed", result));
    // vega's SVG writes every label, axis title and chart title as a <text> element
    const withoutText = svg.replace(/<text\b[^>]*>[\s\S]*?<\/text>/g, "");
    expect(withoutText.length).toBeLessThan(svg.length);
    expect(svg).toContain('font-family="Inter,');
    const same = (a: Uint8Array, b: Uint8Array) => Buffer.compare(Buffer.from(a), Buffer.from(b)) === 0;
    // svgToPng loads no system fonts, so any drawn glyph comes from the packaged TTFs
    expect(same(svgToPng(svg, 1), svgToPng(withoutText, 1))).toBe(false);
    // Control (the check above can fail): with no font at all resvg drops text, and both PNGs match.
    const bare = (s: string) => new Uint8Array(new Resvg(s, { font: { loadSystemFonts: false } }).render().asPng());
    expect(same(bare(svg), bare(withoutText))).toBe(true);
  });

  it("the ledger chart has one bar per non-zero loss term", async () => {
    const spec = chartSpec("ledger", result) as { data: { values: { term: string; kwh: number }[] } };
    const nonZero = SINK_KEYS.filter((k) => result.ledger_j[k] !== 0).length;
    expect(spec.data.values).toHaveLength(nonZero);
    const total = spec.data.values.reduce((s, r) => s + r.kwh, 0);
    // the sinks add up to the inputs (ledger closure, DESIGN §4)
    expect(total * 3.6e6).toBeCloseTo(result.ledger_j.fuel + result.ledger_j.battery_net + result.ledger_j.unmet_demand, 3);
  });

  it("review summary: headline figures, ledger, findings, notes escaped, cautions", () => {
    const html = reviewSummaryHtml({
      title: "Hybrid <A> & B", versionLabel: "version 2", workspaceName: "Powertrain team", result,
      notes: [{ block: "Body", text: "<script>alert(1)</script> c_r from the tyre label" }], generatedAt: new Date("2026-12-01T10:00:00Z"),
    });
    expect(html).toContain("Hybrid &lt;A&gt; &amp; B");
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt; c_r from the tyre label");
    expect(html).toContain(`${result.kpi.fuel_l_per_100km!.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 })} L/100 km`);
    for (const c of CAUTIONS) expect(html).toContain(c.replace(/'/g, "&#39;"));
    expect(html).toContain("@media print");
  });
});
