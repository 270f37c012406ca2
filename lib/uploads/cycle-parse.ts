import { IssueList, issue, type Outcome } from "./issues";
import { MAX_CYCLE_SAMPLES, MAX_LISTED_ISSUES, MIN_CYCLE_ROWS } from "./limits";
import { readTable } from "./table";
import { headersOf, type Layout } from "./layout";
import { readColumns, type ColumnSpec } from "./columns";
import { checkCycleRows, type CycleColumnsRef } from "./cycle-checks";
import { medianSpacing_s, onGrid, resampleLinear, stepCount } from "./resample";
import { fmt } from "./numbers";
import { KMH_PER, SECONDS_PER } from "./units";
import type { CycleConfirmation } from "./confirmation";

/** A validated drive cycle on a uniform step, ready for `cycle: { dt_s, speed_kmh, grade_pct }`. */
export interface UploadedCycle {
  dt_s: number;
  speed_kmh: number[];
  grade_pct?: number[];
  source: {
    rows: number;
    /** First time in the file (s); the cycle starts there as t = 0. */
    time_offset_s: number;
    resampled: boolean;
  };
}

type Key = "time" | "speed" | "grade";

function refOf(c: CycleConfirmation, layout: Layout): CycleColumnsRef {
  const name = (col: number) => layout.headers[col - 1] ?? null;
  return {
    time: c.time ? { ...c.time, name: name(c.time.column) } : null,
    speed: { ...c.speed, name: name(c.speed.column) },
    grade: c.grade ? { ...c.grade, name: name(c.grade.column) } : null,
  };
}

/** Reads, checks and resamples a drive cycle as the user confirmed its layout. */
export function parseCycle(text: string, c: CycleConfirmation): Outcome<UploadedCycle> {
  const issues = new IssueList(MAX_LISTED_ISSUES);
  const rows = readTable(text, c.delimiter);
  const layout: Layout = { delimiter: c.delimiter, decimal: c.decimal, header_rows: c.header_rows, headers: headersOf(rows, c.header_rows) };
  const dataRows = rows.length - c.header_rows;
  if (rows.length === 0) return { ok: false, issues: [issue("the file is empty")] };
  if (dataRows < MIN_CYCLE_ROWS)
    return { ok: false, issues: [issue(`a drive cycle needs at least ${MIN_CYCLE_ROWS} data rows; found ${Math.max(0, dataRows)}`)] };
  const specs: ColumnSpec<Key>[] = [{ key: "speed", column: c.speed.column }];
  if (c.time) specs.unshift({ key: "time", column: c.time.column });
  if (c.grade) specs.push({ key: "grade", column: c.grade.column });
  const read = readColumns(rows, layout, specs, issues);
  if (issues.count > 0 && read.lines.length === 0) return { ok: false, issues: issues.result() };
  const sampleDt = c.sample_dt_s ?? 1;
  const cols = { lines: read.lines, time: c.time ? read.values.time : null, speed: read.values.speed, grade: c.grade ? read.values.grade : null };
  checkCycleRows(cols, refOf(c, layout), sampleDt, issues);
  if (issues.count > 0) return { ok: false, issues: issues.result() };

  const time_s = cols.time ? cols.time.map((t) => t * SECONDS_PER[c.time!.unit]) : cols.speed.map((_, k) => k * sampleDt);
  const speed_kmh = cols.speed.map((v) => v * KMH_PER[c.speed.unit]);
  return resampleCycle(time_s, speed_kmh, cols.grade, c.dt_s, read.lines);
}

function resampleCycle(time_s: number[], speed_kmh: number[], grade: number[] | null, dtGiven: number | null, lines: number[]): Outcome<UploadedCycle> {
  const warnings: string[] = [];
  const dt = dtGiven ?? medianSpacing_s(time_s);
  const span = time_s[time_s.length - 1] - time_s[0];
  const n = stepCount(span, dt);
  if (n < 1) return { ok: false, issues: [issue(`the rows span ${fmt(span)} s, less than one step of ${fmt(dt)} s`)] };
  if (n + 1 > MAX_CYCLE_SAMPLES)
    return { ok: false, issues: [issue(`resampling every ${fmt(dt)} s gives ${n + 1} samples; the limit is ${MAX_CYCLE_SAMPLES}`)] };
  const exact = n === time_s.length - 1 && onGrid(time_s, dt);
  const out: UploadedCycle = {
    dt_s: dt,
    speed_kmh: exact ? speed_kmh : resampleLinear(time_s, speed_kmh, dt, n).map((v) => Math.max(0, v)),
    source: { rows: time_s.length, time_offset_s: time_s[0], resampled: !exact },
  };
  if (grade) out.grade_pct = exact ? grade : resampleLinear(time_s, grade, dt, n);
  if (!exact) warnings.push(`resampled ${time_s.length} rows to ${n + 1} samples every ${fmt(dt)} s by linear interpolation`);
  if (time_s[0] !== 0) warnings.push(`the file starts at ${fmt(time_s[0])} s; the cycle starts there as 0 s`);
  const tail = span - n * dt;
  if (tail > 1e-9 * Math.max(1, span)) warnings.push(`the last ${fmt(tail)} s (shorter than one step) are left out`);
  for (let k = 1; k < time_s.length; k++)
    if (time_s[k] - time_s[k - 1] > 10 * dt) {
      warnings.push(`line ${lines[k]}: a gap of ${fmt(time_s[k] - time_s[k - 1])} s after line ${lines[k - 1]} is bridged by a straight line`);
      break;
    }
  return { ok: true, value: out, warnings };
}
