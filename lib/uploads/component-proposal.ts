import { detectLayout, type Layout } from "./layout";
import { ROLE_PATTERNS, engineSpeedUnitOf, isPercentUnit, splitHeader, type EngineSpeedUnit, type SocUnit } from "./units";
import { readNumber } from "./numbers";
import type { TableRow } from "./table";

export interface FullLoadProposal {
  layout: Layout;
  speed: { column: number; unit: EngineSpeedUnit } | null;
  torque: { column: number } | null;
  notes: string[];
  head: string[][];
}

export interface OcvProposal {
  layout: Layout;
  soc: { column: number; unit: SocUnit } | null;
  voltage: { column: number } | null;
  notes: string[];
  head: string[][];
}

function find(headers: string[], pattern: RegExp, skip: number | null): number | null {
  for (let c = 0; c < headers.length; c++) {
    if (c === skip) continue;
    const { name, unit } = splitHeader(headers[c]);
    if (pattern.test(name) || (unit !== null && pattern.test(unit) && name === "")) return c;
  }
  return null;
}

/** Two-column guess: by header names, else the first two columns in order. */
function twoColumns(layout: Layout, a: RegExp, b: RegExp, notes: string[], what: [string, string]): [number | null, number | null] {
  if (layout.header_rows === 0) {
    notes.push(`no header: column 1 read as ${what[0]}, column 2 as ${what[1]}`);
    return [0, layout.headers.length >= 2 ? 1 : null];
  }
  const first = find(layout.headers, a, null);
  return [first, find(layout.headers, b, first)];
}

export function proposeFullLoad(text: string): { proposal: FullLoadProposal; rows: TableRow[] } {
  const { layout, rows } = detectLayout(text);
  const notes: string[] = [];
  const [s, t] = twoColumns(layout, ROLE_PATTERNS.engine_speed, ROLE_PATTERNS.torque, notes, ["speed in rpm", "torque in N·m"]);
  let speed: FullLoadProposal["speed"] = null;
  if (s !== null) {
    const unitText = layout.header_rows > 0 ? splitHeader(layout.headers[s]).unit : null;
    const unit = (unitText && engineSpeedUnitOf(unitText)) || (/rpm/i.test(layout.headers[s]) ? "rpm" : null);
    if (!unit && layout.header_rows > 0) notes.push(`speed unit not given in "${layout.headers[s]}"; assumed rpm`);
    speed = { column: s + 1, unit: unit ?? "rpm" };
  }
  return { proposal: { layout, speed, torque: t !== null ? { column: t + 1 } : null, notes, head: rows.slice(0, 8).map((r) => r.cells) }, rows };
}

/** SOC given in percent when the header says so or any value exceeds 1. */
function socUnit(rows: TableRow[], layout: Layout, column: number, notes: string[]): SocUnit {
  const unitText = layout.header_rows > 0 ? splitHeader(layout.headers[column]).unit : null;
  if (unitText && isPercentUnit(unitText)) return "%";
  if (unitText) return "fraction";
  const big = rows.slice(layout.header_rows).some((r) => {
    const v = readNumber(r.cells[column] ?? "", layout.decimal);
    return v.ok && v.value > 1;
  });
  notes.push(big ? "SOC values above 1: read as percent" : "SOC values within 0–1: read as a fraction");
  return big ? "%" : "fraction";
}

export function proposeOcv(text: string): { proposal: OcvProposal; rows: TableRow[] } {
  const { layout, rows } = detectLayout(text);
  const notes: string[] = [];
  const [s, v] = twoColumns(layout, ROLE_PATTERNS.soc, ROLE_PATTERNS.voltage, notes, ["SOC", "voltage in V"]);
  const soc = s !== null ? { column: s + 1, unit: socUnit(rows, layout, s, notes) } : null;
  return { proposal: { layout, soc, voltage: v !== null ? { column: v + 1 } : null, notes, head: rows.slice(0, 8).map((r) => r.cells) }, rows };
}
