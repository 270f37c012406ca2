import { detectLayout, type Layout } from "./layout";
import { ROLE_PATTERNS, splitHeader, speedUnitOf, timeUnitOf, isPercentUnit, type SpeedUnit, type TimeUnit } from "./units";
import type { TableRow } from "./table";

export interface CycleColumns {
  /** null: no time column; samples are `sample_dt_s` apart. */
  time: { column: number; unit: TimeUnit } | null;
  speed: { column: number; unit: SpeedUnit } | null;
  grade: { column: number } | null;
  /** Spacing of the rows when there is no time column. */
  sample_dt_s: number | null;
}

export interface CycleProposal extends CycleColumns {
  layout: Layout;
  /** What was guessed rather than read from the file, for the user to confirm. */
  notes: string[];
  /** The first rows as read, for the confirmation screen. */
  head: string[][];
}

function findRole(headers: string[], pattern: RegExp, taken: Set<number>): number | null {
  for (let c = 0; c < headers.length; c++) {
    if (taken.has(c)) continue;
    const { name, unit } = splitHeader(headers[c]);
    if (pattern.test(name) || (name === "" && unit !== null && pattern.test(unit))) return c;
  }
  return null;
}

/** A header that is only a speed unit ("km/h", "mph") names the speed column. */
function findBySpeedUnit(headers: string[], taken: Set<number>): number | null {
  for (let c = 0; c < headers.length; c++) if (!taken.has(c) && speedUnitOf(headers[c]) && !timeUnitOf(headers[c])) return c;
  return null;
}

function columnsFromHeaders(headers: string[], notes: string[]): CycleColumns {
  const taken = new Set<number>();
  const t = findRole(headers, ROLE_PATTERNS.time, taken);
  if (t !== null) taken.add(t);
  const v = findRole(headers, ROLE_PATTERNS.speed, taken) ?? findBySpeedUnit(headers, taken);
  if (v !== null) taken.add(v);
  const g = findRole(headers, ROLE_PATTERNS.grade, taken);
  let time: CycleColumns["time"] = null;
  if (t !== null) {
    const unitText = splitHeader(headers[t]).unit;
    const unit = unitText ? timeUnitOf(unitText) : null;
    if (!unit) notes.push(`time unit not given in "${headers[t]}"; assumed seconds`);
    time = { column: t + 1, unit: unit ?? "s" };
  } else notes.push("no time column found; rows assumed 1 s apart");
  let speed: CycleColumns["speed"] = null;
  if (v !== null) {
    const split = splitHeader(headers[v]);
    const unit = speedUnitOf(split.unit ?? "") ?? speedUnitOf(split.name);
    if (!unit) notes.push(`speed unit not given in "${headers[v]}"; assumed km/h`);
    speed = { column: v + 1, unit: unit ?? "km/h" };
  }
  let grade: CycleColumns["grade"] = null;
  if (g !== null) {
    const unitText = splitHeader(headers[g]).unit;
    if (unitText && !isPercentUnit(unitText)) notes.push(`grade unit "${unitText}" read as percent`);
    grade = { column: g + 1 };
  }
  return { time, speed, grade, sample_dt_s: time ? null : 1 };
}

function columnsWithoutHeader(width: number, notes: string[]): CycleColumns {
  if (width === 1) {
    notes.push("one column without a header: read as speed in km/h, rows 1 s apart");
    return { time: null, speed: { column: 1, unit: "km/h" }, grade: null, sample_dt_s: 1 };
  }
  notes.push(`no header: column 1 read as time in s, column 2 as speed in km/h${width >= 3 ? ", column 3 as grade in %" : ""}`);
  return { time: { column: 1, unit: "s" }, speed: { column: 2, unit: "km/h" }, grade: width >= 3 ? { column: 3 } : null, sample_dt_s: null };
}

/** Guesses layout, columns and units of an uploaded drive cycle. */
export function proposeCycle(text: string): { proposal: CycleProposal; rows: TableRow[] } {
  const { layout, rows } = detectLayout(text);
  const notes: string[] = [];
  const cols = layout.header_rows > 0 ? columnsFromHeaders(layout.headers, notes) : columnsWithoutHeader(layout.headers.length, notes);
  if (layout.decimal === ",") notes.push("decimal comma detected");
  const head = rows.slice(0, 8).map((r) => r.cells);
  return { proposal: { ...cols, layout, notes, head }, rows };
}
