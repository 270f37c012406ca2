import type { BatteryStep } from "./battery-step";
import type { CostToGo } from "./cost-to-go";

/** Battery quantities of each SOC grid point, computed once per pass (OCV lookups are costly next to the hot loop). */
export interface GridTables {
  soc: Float64Array;
  u: Float64Array;
  /** Most negative terminal power within the charge-current limit and soc_max (Battery.chargeLimit_w). */
  chargeLimit: Float64Array;
  /** Largest terminal power within P_max, the discharge-current limit and soc_min (Battery.dischargeLimit_w). */
  dischargeLimit: Float64Array;
  /** U/(2R): the current of peak power (Infinity when R = 0). */
  peakCurrent: Float64Array;
  /** Per-row work space of the backward pass: [pLo, pHi, U², b0] per grid point. */
  scratch: Float64Array;
}

export function gridTables(bs: BatteryStep, c: CostToGo, dt_s: number): GridTables {
  const m = c.socPoints;
  const b = bs.battery;
  const buf = new Float64Array(5 * m);
  const g: GridTables = {
    soc: buf.subarray(0, m), u: buf.subarray(m, 2 * m), chargeLimit: buf.subarray(2 * m, 3 * m),
    dischargeLimit: buf.subarray(3 * m, 4 * m), peakCurrent: buf.subarray(4 * m), scratch: new Float64Array(4 * m),
  };
  for (let i = 0; i < m; i++) {
    const s = i === m - 1 ? b.socMax : c.soc0 + i * c.h;
    g.soc[i] = s;
    g.u[i] = b.ocv_v(s);
    g.chargeLimit[i] = b.chargeLimit_w(s, dt_s);
    g.dischargeLimit[i] = b.dischargeLimit_w(s, dt_s);
    g.peakCurrent[i] = b.resistance_ohm > 0 ? g.u[i] / (2 * b.resistance_ohm) : Infinity;
  }
  return g;
}
