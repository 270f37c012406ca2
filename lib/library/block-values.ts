// Component tables from the library go into the engine or battery block's list fields as text
// in the notebook's list syntax ("800, 1500, 3000 rpm"). Pure.
import type { LibraryKind } from "./kinds";

export type ComponentData = { speed_rpm?: number[]; torque_nm?: number[]; soc?: number[]; voltage_v?: number[] };

/** Numbers written with up to 12 significant digits: exact for any value an upload can hold. */
const list = (xs: number[], unit: string) => `${xs.map((x) => String(Number(x.toPrecision(12)))).join(", ")}${unit ? ` ${unit}` : ""}`;

/** [field label, text to paste] for the block fields the item fills. */
export function blockValueLines(kind: LibraryKind, d: ComponentData): [string, string][] {
  if (kind === "engine_full_load" && d.speed_rpm && d.torque_nm)
    return [["Engine › Full-load curve: speeds", list(d.speed_rpm, "rpm")], ["Engine › Full-load curve: torques", list(d.torque_nm, "N·m")]];
  if (kind === "battery_ocv" && d.soc && d.voltage_v)
    return [["Battery › Open-circuit voltage: SOC points", list(d.soc, "")], ["Battery › Open-circuit voltage: voltages", list(d.voltage_v, "V")]];
  return [];
}
