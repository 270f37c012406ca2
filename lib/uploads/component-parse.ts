import { IssueList, issue, type Outcome } from "./issues";
import { MAX_ENGINE_SPEED_RPM, MAX_ENGINE_TORQUE_NM, MAX_LISTED_ISSUES, MAX_PACK_VOLTAGE_V } from "./limits";
import { readTable } from "./table";
import { headersOf, type Layout } from "./layout";
import { readColumns } from "./columns";
import { checkRange, checkRising, type Column } from "./breakpoints";
import { fmt } from "./numbers";
import type { FullLoadConfirmation, OcvConfirmation } from "./confirmation";

export interface FullLoadCurve { speed_rpm: number[]; torque_nm: number[] }
export interface OcvCurve { soc: number[]; voltage_v: number[] }

/** Curves need two breakpoints at least (the scenario schema's minimum). */
const MIN_BREAKPOINTS = 2;

function prepare(text: string, c: { delimiter: FullLoadConfirmation["delimiter"]; decimal: "." | ","; header_rows: 0 | 1 | 2 }) {
  const rows = readTable(text, c.delimiter);
  const layout: Layout = { delimiter: c.delimiter, decimal: c.decimal, header_rows: c.header_rows, headers: headersOf(rows, c.header_rows) };
  const dataRows = rows.length - c.header_rows;
  const early = rows.length === 0 ? [issue("the file is empty")]
    : dataRows < MIN_BREAKPOINTS ? [issue(`a curve needs at least ${MIN_BREAKPOINTS} data rows; found ${Math.max(0, dataRows)}`)] : null;
  return { rows, layout, early };
}

const col = (layout: Layout, column: number, label: string, unit: string): Column => ({ column, name: layout.headers[column - 1] ?? null, label, unit });

/** Engine full-load curve: speed rising strictly, positive speeds, torques ≥ 0 and not all zero. */
export function parseFullLoad(text: string, c: FullLoadConfirmation): Outcome<FullLoadCurve> {
  const { rows, layout, early } = prepare(text, c);
  if (early) return { ok: false, issues: early };
  const issues = new IssueList(MAX_LISTED_ISSUES);
  const read = readColumns(rows, layout, [{ key: "speed", column: c.speed.column }, { key: "torque", column: c.torque.column }], issues);
  const toRpm = c.speed.unit === "rpm" ? 1 : 30 / Math.PI;
  const speed_rpm = read.values.speed.map((v) => v * toRpm);
  const torque = read.values.torque;
  checkRange(read.lines, speed_rpm, col(layout, c.speed.column, "speed", "rpm"), 0, MAX_ENGINE_SPEED_RPM, true, issues);
  checkRising(read.lines, speed_rpm, col(layout, c.speed.column, "speed", "rpm"), issues);
  checkRange(read.lines, torque, col(layout, c.torque.column, "torque", "N·m"), 0, MAX_ENGINE_TORQUE_NM, false, issues);
  if (issues.count === 0 && torque.every((t) => t === 0)) issues.add(issue("every torque is 0 N·m; a full-load curve needs positive torque", null, c.torque.column, layout.headers[c.torque.column - 1] ?? null));
  if (issues.count > 0) return { ok: false, issues: issues.result() };
  return { ok: true, value: { speed_rpm, torque_nm: torque }, warnings: [] };
}

/** Battery OCV curve: SOC rising strictly within 0..1, voltages positive; a falling voltage is a warning. */
export function parseOcv(text: string, c: OcvConfirmation): Outcome<OcvCurve> {
  const { rows, layout, early } = prepare(text, c);
  if (early) return { ok: false, issues: early };
  const issues = new IssueList(MAX_LISTED_ISSUES);
  const read = readColumns(rows, layout, [{ key: "soc", column: c.soc.column }, { key: "voltage", column: c.voltage.column }], issues);
  const pct = c.soc.unit === "%";
  const socCol = col(layout, c.soc.column, "SOC", pct ? "%" : "");
  checkRange(read.lines, read.values.soc, socCol, 0, pct ? 100 : 1, false, issues);
  checkRising(read.lines, read.values.soc, socCol, issues);
  checkRange(read.lines, read.values.voltage, col(layout, c.voltage.column, "voltage", "V"), 0, MAX_PACK_VOLTAGE_V, true, issues);
  if (issues.count > 0) return { ok: false, issues: issues.result() };
  const soc = read.values.soc.map((s) => (pct ? s / 100 : s));
  const v = read.values.voltage;
  const warnings: string[] = [];
  // an OCV curve rises with SOC for lithium-ion cells (common practice, no source); measured flat plateaus may dip slightly
  for (let k = 1; k < v.length; k++)
    if (v[k] < v[k - 1]) { warnings.push(`line ${read.lines[k]}: voltage ${fmt(v[k])} V is below ${fmt(v[k - 1])} V at a lower SOC; an OCV curve normally rises with SOC`); break; }
  return { ok: true, value: { soc, voltage_v: v }, warnings };
}
