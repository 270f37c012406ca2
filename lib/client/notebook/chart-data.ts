// Result → chart rows. Pure functions; every number that leaves here is finite (a NaN in a
// vega dataset breaks scales silently), and long traces are thinned to a fixed budget.
import { SINK_KEYS, type LedgerKey, type Result } from "@/lib/engine";

const J_PER_KWH = 3.6e6;

export const LEDGER_LABELS: Record<LedgerKey, string> = {
  fuel: "Fuel",
  battery_net: "Battery, net",
  unmet_demand: "Unmet demand",
  aero: "Aerodynamic drag",
  rolling: "Rolling resistance",
  grade: "Grade (potential energy)",
  kinetic: "Kinetic energy (net)",
  friction_brakes: "Friction brakes",
  driveline: "Driveline",
  clutch: "Clutch slip",
  engine: "Engine",
  motor: "Electric machine",
  generator: "Generator",
  battery_internal: "Battery internal",
  auxiliaries: "Auxiliaries",
};

/** Road work stays in the vehicle's motion or position; the rest is lost as heat or used on board. */
export type FlowGroup = "fuel" | "electric" | "road" | "loss" | "aux" | "unmet";

export const GROUP_OF: Record<LedgerKey, FlowGroup> = {
  fuel: "fuel", battery_net: "electric", unmet_demand: "unmet",
  aero: "road", rolling: "road", grade: "road", kinetic: "road",
  friction_brakes: "loss", driveline: "loss", clutch: "loss", engine: "loss", motor: "loss", generator: "loss",
  battery_internal: "loss", auxiliaries: "aux",
};

export function finite(x: unknown): x is number {
  return typeof x === "number" && Number.isFinite(x);
}

const num = (x: unknown): number => (finite(x) ? x : 0);

export interface LedgerRow {
  key: LedgerKey;
  label: string;
  side: "supply" | "sink";
  group: FlowGroup;
  j: number;
  kwh: number;
  /** share of the energy put in (fuel + battery discharge + unmet), % — null when nothing went in */
  pct: number | null;
}

/** Energy put in over the cycle: positive supplies only (a pack that ends fuller is a sink). */
export function inputEnergy_j(result: Result): number {
  const l = result.ledger_j;
  return Math.max(0, num(l.fuel)) + Math.max(0, num(l.battery_net)) + Math.max(0, num(l.unmet_demand));
}

export function ledgerRows(result: Result): LedgerRow[] {
  const input = inputEnergy_j(result);
  const row = (key: LedgerKey, side: LedgerRow["side"]): LedgerRow => {
    const j = num(result.ledger_j[key]);
    return { key, label: LEDGER_LABELS[key], side, group: GROUP_OF[key], j, kwh: j / J_PER_KWH, pct: input > 0 ? (100 * j) / input : null };
  };
  const supplies: LedgerRow[] = [row("fuel", "supply"), row("battery_net", "supply")];
  if (num(result.ledger_j.unmet_demand) !== 0) supplies.push(row("unmet_demand", "supply"));
  return [...supplies, ...SINK_KEYS.map((k) => row(k, "sink"))];
}

export interface FlowRow {
  /** "In" (sources) or "Out" (where the energy went) */
  column: "Energy in" | "Energy out";
  label: string;
  group: FlowGroup;
  kwh: number;
  order: number;
}

/**
 * Energy flow as two balanced stacks: what came in (fuel, battery discharge, kinetic or potential
 * energy released) and where it went. A term with the "wrong" sign moves to the other column
 * (a pack that ends fuller is energy out: "Stored in battery"), so both columns have the same height.
 */
export function flowRows(result: Result): FlowRow[] {
  const rows: FlowRow[] = [];
  const keys: LedgerKey[] = ["fuel", "battery_net", "unmet_demand", ...SINK_KEYS];
  keys.forEach((key, order) => {
    const j = num(result.ledger_j[key]);
    if (Math.abs(j) < 1) return;
    const supply = key === "fuel" || key === "battery_net" || key === "unmet_demand";
    const inColumn = supply ? j > 0 : j < 0;
    let label = LEDGER_LABELS[key];
    if (key === "battery_net") label = j > 0 ? "Battery discharge" : "Stored in battery";
    else if (!supply && j < 0) label = `${label}, released`;
    rows.push({ column: inColumn ? "Energy in" : "Energy out", label, group: GROUP_OF[key], kwh: Math.abs(j) / J_PER_KWH, order });
  });
  return rows;
}

/** Indices of at most `budget` samples, evenly spread, always including the last. */
export function thin(n: number, budget: number): number[] {
  if (n <= budget) return Array.from({ length: n }, (_, i) => i);
  const step = (n - 1) / (budget - 1);
  return Array.from({ length: budget }, (_, i) => Math.round(i * step));
}

export interface TraceRow {
  series: string;
  t: number;
  value: number;
}

export const TRACE_BUDGET = 1500;

export interface TracePanelData {
  id: string;
  kind: "speed" | "power" | "soc" | "gear";
  title: string;
  /** the series drawn, in legend order (a key is shown when there is more than one) */
  series: string[];
  rows: TraceRow[];
}

/** Small multiples: speed, power split (engine, motor, generator, friction brakes), SOC (%), gear (with more than one). */
export function tracePanels(result: Result): TracePanelData[] {
  const tr = result.traces;
  const idx = thin(tr.time_s.length, TRACE_BUDGET);
  const series = (name: string, values: readonly number[] | undefined, scale = 1): TraceRow[] => {
    const out: TraceRow[] = [];
    if (!values) return out;
    for (const i of idx) {
      const t = tr.time_s[i];
      const v = values[i];
      if (finite(t) && finite(v)) out.push({ series: name, t, value: v * scale });
    }
    return out;
  };
  const pt = result.powertrain;
  const powerSources: [string, readonly number[] | undefined, number][] = [];
  if (pt !== "bev") powerSources.push(["engine", tr.engine_power_w, 1e-3]);
  if (pt !== "conventional") powerSources.push(["motor", tr.motor_power_w, 1e-3]);
  if (pt === "series") powerSources.push(["generator", tr.generator_power_w, 1e-3]);
  powerSources.push(["friction brakes", tr.brake_power_w, -1e-3]);
  const power = powerSources.flatMap(([name, values, scale]) => series(name, values, scale));
  const panels: TracePanelData[] = [
    { id: "trace_speed", kind: "speed", title: "Speed (km/h)", series: ["speed"], rows: series("speed", tr.speed_kmh) },
    { id: "trace_power", kind: "power", title: "Power split (kW; brakes negative)", series: powerSources.map(([name]) => name), rows: power },
  ];
  if (pt !== "conventional") panels.push({ id: "trace_soc", kind: "soc", title: "SOC (%)", series: ["SOC"], rows: series("SOC", tr.soc, 100) });
  // A single fixed reduction has nothing to show but "1 when moving": no gear panel then.
  const gears = series("gear", tr.gear);
  if (gears.some((r) => r.value > 1)) panels.push({ id: "trace_gear", kind: "gear", title: "Gear", series: ["gear"], rows: gears });
  return panels;
}

export interface OperatingPoint {
  speed_rpm: number;
  torque_nm: number;
}

/** Engine speed and torque of the steps with the engine on and delivering torque. */
export function operatingPoints(result: Result): OperatingPoint[] {
  const tr = result.traces;
  const out: OperatingPoint[] = [];
  for (const i of thin(tr.time_s.length, 4000)) {
    const on = tr.engine_on[i];
    const w = tr.engine_speed_rpm[i];
    const t = tr.engine_torque_nm[i];
    if (on && finite(w) && finite(t) && w > 0) out.push({ speed_rpm: w, torque_nm: t });
  }
  return out;
}

export interface PointCell extends OperatingPoint {
  /** steps the engine ran at this point */
  steps: number;
}

/**
 * Operating points merged at 10 rpm and 1 N·m (finer than a dot on the chart), with the number
 * of steps at each: a genset run at fixed points spends hundreds of steps on one or two points,
 * which a plain scatter draws as a single dot of the same size as a one-step point.
 */
export function distinctPoints(points: readonly OperatingPoint[]): PointCell[] {
  const cells = new Map<string, PointCell>();
  for (const p of points) {
    const w = Math.round(p.speed_rpm / 10) * 10;
    const t = Math.round(p.torque_nm);
    const key = `${w}:${t}`;
    const cell = cells.get(key);
    if (cell) cell.steps += 1;
    else cells.set(key, { speed_rpm: w, torque_nm: t, steps: 1 });
  }
  return [...cells.values()];
}

export function fullLoadCurve(result: Result): OperatingPoint[] {
  const c = result.curves.engine_full_load;
  if (!c) return [];
  const out: OperatingPoint[] = [];
  for (let i = 0; i < c.speed_rpm.length; i++) {
    const w = c.speed_rpm[i];
    const t = c.torque_nm[i];
    if (finite(w) && finite(t)) out.push({ speed_rpm: w, torque_nm: t });
  }
  return out;
}
