// A printable one-page review summary: headline figures, loss ledger, findings, block notes and
// the cautions every result carries. Plain HTML with print CSS, rendered on the server; every
// user-supplied string is escaped.
import { SINK_KEYS, SUPPLY_KEYS, type Result } from "@/lib/engine";
import { ledgerLabel } from "./charts";

export interface ReviewSummaryInput {
  title: string;
  /** "version 3 — after the tyre change", or "current draft". */
  versionLabel: string;
  workspaceName: string;
  result: Result;
  notes: { block: string; text: string }[];
  generatedAt: Date;
  /** An inline SVG chart (rendered by us, not user input), e.g. the speed trace. */
  chartSvg?: string;
}

export const CAUTIONS = [
  "These are concept-stage estimates on a quasi-static (backward) model, not type-approval or certification figures.",
  "Battery current, voltage and temperature limits come from the cell maker's data and the applicable safety standards and local regulations, not from this tool.",
];

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
const num = (x: number | null, digits: number) => (x === null || !Number.isFinite(x) ? "—" : x.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits }));

function headline(r: Result): [string, string][] {
  const k = r.kpi;
  const rows: [string, string][] = [
    ["distance", `${num(k.distance_km, 3)} km`], ["duration", `${num(k.duration_s, 0)} s`],
  ];
  if (k.fuel_l_per_100km !== null && k.fuel_g > 0) rows.push(["fuel", `${num(k.fuel_l_per_100km, 2)} L/100 km`], ["CO₂", `${num(k.co2_g_per_km, 1)} g/km`]);
  if (k.electric_kwh_per_100km !== null && k.soc_initial !== null) rows.push(["electric", `${num(k.electric_kwh_per_100km, 2)} kWh/100 km`]);
  if (k.soc_initial !== null) rows.push(["SOC", `${num(k.soc_initial * 100, 1)} % → ${num((k.soc_final ?? 0) * 100, 1)} %`]);
  rows.push(["feasible", k.feasible ? "yes" : `no — ${k.infeasible_steps} infeasible step${k.infeasible_steps === 1 ? "" : "s"}`]);
  return rows;
}

function ledgerRows(r: Result): string {
  const supply = SUPPLY_KEYS.reduce((s, key) => s + r.ledger_j[key], 0);
  const row = (label: string, j: number) =>
    `<tr><td>${esc(label)}</td><td class="n">${num(j / 3.6e6, 4)}</td><td class="n">${supply !== 0 ? num((100 * j) / supply, 1) : "—"}</td></tr>`;
  const inputs = SUPPLY_KEYS.filter((key) => r.ledger_j[key] !== 0).map((key) => row(ledgerLabel(key), r.ledger_j[key]));
  const sinks = SINK_KEYS.filter((key) => r.ledger_j[key] !== 0).map((key) => row(ledgerLabel(key), r.ledger_j[key]));
  return `<tr class="group"><th colspan="3">in</th></tr>${inputs.join("")}<tr class="group"><th colspan="3">out</th></tr>${sinks.join("")}` +
    `<tr class="closure"><td>closure error</td><td class="n">${r.closure_error_j.toExponential(2)} J</td><td></td></tr>`;
}

function findings(r: Result): string {
  if (r.findings.length === 0) return "<p class=\"muted\">No findings.</p>";
  const items = r.findings.slice(0, 12).map((f) => {
    const when = f.time_start_s !== null ? ` <span class="muted">(${num(f.time_start_s, 0)}–${num(f.time_end_s, 0)} s)</span>` : "";
    return `<li class="${f.severity}"><strong>${esc(f.component)}</strong>: ${esc(f.message)}${when}</li>`;
  });
  const more = r.findings.length > 12 ? `<li class="muted">and ${r.findings.length - 12} more</li>` : "";
  return `<ul>${items.join("")}${more}</ul>`;
}

const CSS = `
@page { size: A4; margin: 14mm; }
* { box-sizing: border-box; }
body { font: 10pt/1.35 "Inter", "DejaVu Sans", Helvetica, Arial, sans-serif; color: #1e1b16; background: #fcfaf5; margin: 0; padding: 16px; }
h1 { font-size: 15pt; margin: 0; } h2 { font-size: 11pt; margin: 12px 0 4px; border-bottom: 1px solid #d9cfbd; }
.meta { color: #6a6254; margin: 2px 0 8px; }
.cols { display: grid; grid-template-columns: 1fr 1fr; gap: 16px; }
table { border-collapse: collapse; width: 100%; } td, th { padding: 2px 4px; text-align: left; }
td.n { text-align: right; font-family: "JetBrains Mono", "DejaVu Sans Mono", monospace; }
tr.group th { font-weight: 600; color: #6a6254; padding-top: 4px; } tr.closure td { border-top: 1px solid #d9cfbd; color: #6a6254; }
dl { display: grid; grid-template-columns: auto 1fr; gap: 2px 12px; margin: 0; } dt { color: #6a6254; } dd { margin: 0; font-family: "JetBrains Mono", "DejaVu Sans Mono", monospace; }
ul { margin: 0; padding-left: 16px; } li.infeasible strong { color: #a5281b; }
.muted { color: #6a6254; } .chart svg { width: 100%; height: auto; }
.cautions { margin-top: 10px; font-size: 8.5pt; color: #6a6254; border-top: 1px solid #d9cfbd; padding-top: 4px; }
.print { position: fixed; top: 12px; right: 16px; }
@media print { .print { display: none; } body { background: #fff; padding: 0; } }
`;

export function reviewSummaryHtml(s: ReviewSummaryInput): string {
  const r = s.result;
  const notes = s.notes.filter((n) => n.text.trim() !== "");
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${esc(s.title)} — review summary</title><style>${CSS}</style></head><body>
<p class="print muted">Print with your browser (Ctrl+P / ⌘P): the page fits one A4 sheet.</p>
<h1>${esc(s.title)}</h1>
<p class="meta">${esc(s.workspaceName)} · ${esc(s.versionLabel)} · ${esc(r.powertrain)}${r.strategy ? ` · ${esc(r.strategy)}` : ""} · generated ${esc(s.generatedAt.toISOString().slice(0, 16).replace("T", " "))} UTC</p>
<div class="cols"><section><h2>Headline figures</h2><dl>${headline(r).map(([k, v]) => `<dt>${esc(k)}</dt><dd>${esc(v)}</dd>`).join("")}</dl>
<h2>Findings</h2>${findings(r)}</section>
<section><h2>Loss ledger (kWh, % of input)</h2><table>${ledgerRows(r)}</table></section></div>
${s.chartSvg ? `<section class="chart"><h2>Speed trace</h2>${s.chartSvg}</section>` : ""}
<h2>Notes</h2>${notes.length ? `<ul>${notes.map((n) => `<li><strong>${esc(n.block)}</strong>: ${esc(n.text)}</li>`).join("")}</ul>` : "<p class=\"muted\">No notes.</p>"}
<div class="cautions">${CAUTIONS.map((c) => `<p>${esc(c)}</p>`).join("")}</div>
</body></html>`;
}
