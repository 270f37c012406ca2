import { IssueList, issue } from "./issues";
import { fmt } from "./numbers";
import { MAX_ACCEL_M_S2, MAX_GRADE_PCT, MAX_SPEED_KMH } from "./limits";
import { KMH_PER, SECONDS_PER, type SpeedUnit, type TimeUnit } from "./units";

export interface CycleRows {
  lines: number[];
  /** In file units; NaN where the cell could not be read. */
  time: number[] | null;
  speed: number[];
  grade: number[] | null;
}

export interface CycleColumnsRef {
  time: { column: number; unit: TimeUnit; name: string | null } | null;
  speed: { column: number; unit: SpeedUnit; name: string | null };
  grade: { column: number; name: string | null } | null;
}

/** Time must start at or after zero and rise strictly from row to row. */
function checkTime(rows: CycleRows, ref: CycleColumnsRef, issues: IssueList): void {
  if (!rows.time || !ref.time) return;
  const { column, unit, name } = ref.time;
  let prev = NaN, prevLine = 0;
  rows.time.forEach((t, k) => {
    const line = rows.lines[k];
    if (Number.isNaN(t)) return;
    if (t < 0) issues.add(issue(`time ${fmt(t)} ${unit} is negative`, line, column, name));
    else if (t === prev) issues.add(issue(`time ${fmt(t)} ${unit} repeats line ${prevLine}`, line, column, name));
    else if (t < prev) issues.add(issue(`time ${fmt(t)} ${unit} is earlier than ${fmt(prev)} ${unit} on line ${prevLine}; times must increase`, line, column, name));
    if (!(t < prev)) { prev = t; prevLine = line; }
  });
}

/** Speeds non-negative and plausible; accelerations between rows plausible. */
function checkSpeed(rows: CycleRows, ref: CycleColumnsRef, sampleDt_s: number, issues: IssueList): void {
  const { column, unit, name } = ref.speed;
  const toKmh = KMH_PER[unit];
  let prevV = NaN, prevT = NaN, prevLine = 0;
  rows.speed.forEach((v, k) => {
    const line = rows.lines[k];
    const t_s = rows.time && ref.time ? rows.time[k] * SECONDS_PER[ref.time.unit] : k * sampleDt_s;
    if (Number.isNaN(v)) { prevV = NaN; return; }
    const kmh = v * toKmh;
    const inKmh = unit === "km/h" ? "" : ` (${fmt(kmh)} km/h)`;
    if (v < 0) issues.add(issue(`speed ${fmt(v)} ${unit} is negative`, line, column, name));
    else if (kmh > MAX_SPEED_KMH) issues.add(issue(`speed ${fmt(v)} ${unit}${inKmh} is above the plausible ${MAX_SPEED_KMH} km/h`, line, column, name));
    else if (!Number.isNaN(prevV) && t_s > prevT) {
      const a = (kmh - prevV) / 3.6 / (t_s - prevT);
      if (Math.abs(a) > MAX_ACCEL_M_S2)
        issues.add(issue(`acceleration ${fmt(Number(a.toFixed(2)))} m/s² since line ${prevLine} is beyond the plausible ±${MAX_ACCEL_M_S2} m/s²`, line, column, name));
    }
    prevV = kmh; prevT = t_s; prevLine = line;
  });
}

function checkGrade(rows: CycleRows, ref: CycleColumnsRef, issues: IssueList): void {
  if (!rows.grade || !ref.grade) return;
  const { column, name } = ref.grade;
  rows.grade.forEach((g, k) => {
    if (!Number.isNaN(g) && Math.abs(g) > MAX_GRADE_PCT)
      issues.add(issue(`grade ${fmt(g)} % is steeper than the plausible ±${MAX_GRADE_PCT} %`, rows.lines[k], column, name));
  });
}

export function checkCycleRows(rows: CycleRows, ref: CycleColumnsRef, sampleDt_s: number, issues: IssueList): void {
  checkTime(rows, ref, issues);
  checkSpeed(rows, ref, sampleDt_s, issues);
  checkGrade(rows, ref, issues);
}
