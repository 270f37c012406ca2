import { IssueList, issue } from "./issues";
import { fmt } from "./numbers";

const q = (v: number, unit: string) => (unit ? `${fmt(v)} ${unit}` : fmt(v));

export interface Column {
  column: number;
  name: string | null;
  label: string;
  unit: string;
}

/** Breakpoints must rise strictly from row to row (a curve is a function of them). */
export function checkRising(lines: number[], x: number[], col: Column, issues: IssueList): void {
  let prev = NaN, prevLine = 0;
  x.forEach((v, k) => {
    if (Number.isNaN(v)) return;
    if (v === prev) issues.add(issue(`${col.label} ${q(v, col.unit)} repeats line ${prevLine}; breakpoints must rise strictly`, lines[k], col.column, col.name));
    else if (v < prev) issues.add(issue(`${col.label} ${q(v, col.unit)} is below ${q(prev, col.unit)} on line ${prevLine}; sort the rows so that ${col.label} rises`, lines[k], col.column, col.name));
    if (!(v < prev)) { prev = v; prevLine = lines[k]; }
  });
}

/** Every value within [min, max] (min exclusive when `minExclusive`). */
export function checkRange(lines: number[], x: number[], col: Column, min: number, max: number, minExclusive: boolean, issues: IssueList): void {
  x.forEach((v, k) => {
    if (Number.isNaN(v)) return;
    if (minExclusive ? v <= min : v < min)
      issues.add(issue(`${col.label} ${q(v, col.unit)} must be ${minExclusive ? "above" : "at least"} ${q(min, col.unit)}`, lines[k], col.column, col.name));
    else if (v > max) issues.add(issue(`${col.label} ${q(v, col.unit)} is above the plausible ${q(max, col.unit)}`, lines[k], col.column, col.name));
  });
}
