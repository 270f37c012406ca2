import type { Demand } from "@/lib/engine/demand";
import { Battery } from "@/lib/engine/models/battery";
import { ElectricMachine } from "@/lib/engine/models/electric-machine";
import { finishBattery } from "@/lib/engine/plants/common";
import { MODE_ENGINE_ON } from "@/lib/engine/plants/plant";
import type { HybridPlant } from "@/lib/engine/strategies/dp/tables";
import { S_AUX_W, S_ENGINE_LOSS_W, S_ENGINE_ON, S_ENGINE_POWER_W, S_FUEL_W, clearStep } from "@/lib/engine/step-output";

/**
 * The REFERENCES.md convex oracle as a plant: an always-on engine with fuel power
 * a + b·P_e + c·P_e², a lossless battery (R = 0, flat OCV), electrical demand D_k on the bus.
 * Candidate j runs the engine at P_e = j·step_w; the battery carries D_k − P_e.
 * Used to test the DP / ECMS / bisection core on the real tables and simulator.
 */
export interface ConvexOracle {
  demands_w: number[];
  a_w: number;
  b: number;
  c_per_w: number;
  step_w: number;
  candidates: number;
  ocv_v: number;
  capacity_ah: number;
  soc_initial: number;
  soc_min?: number;
  soc_max?: number;
}

function demandOf(n: number, dt: number): Demand {
  const f = () => new Float64Array(n);
  return {
    n, dt_s: dt, time_s: Float64Array.from({ length: n }, (_, k) => k * dt), speed_m_s: f(), accel_m_s2: f(),
    moving: new Uint8Array(n), aero_w: f(), rolling_w: f(), grade_w: f(), inertia_w: f(), wheel_w: f(),
    gear: new Uint8Array(n), shaft_rad_s: f(), shaft_w: f(), driveline_efficiency: 1, distance_m: 0,
  };
}

export function convexPlant(o: ConvexOracle): HybridPlant {
  const battery = new Battery({
    capacity_ah: o.capacity_ah, ocv: { soc: [0, 1], voltage_v: [o.ocv_v, o.ocv_v] }, resistance_ohm: 0,
    soc_initial: o.soc_initial, soc_min: o.soc_min ?? 0.05, soc_max: o.soc_max ?? 0.95, max_discharge_c: 1e6, max_charge_c: 1e6,
  });
  const demand = demandOf(o.demands_w.length, 1);
  return {
    powertrain: "series", demand, battery, engine: null, aux_w: 0,
    motor: new ElectricMachine({ peak_power_kw: 1, peak_torque_nm: 1, max_speed_rpm: 1, efficiency: 1 }),
    candidateCount: () => o.candidates,
    candidate(_k, j, _cp, ctl) {
      ctl[0] = MODE_ENGINE_ON;
      ctl[1] = j * o.step_w;
    },
    drive(k, _soc, _mode, pe, out) {
      clearStep(out);
      const fuel = o.a_w + o.b * pe + o.c_per_w * pe * pe;
      out[S_ENGINE_ON] = 1;
      out[S_ENGINE_POWER_W] = pe;
      out[S_FUEL_W] = fuel;
      out[S_ENGINE_LOSS_W] = fuel - pe;
      out[S_AUX_W] = o.demands_w[k]; // the demand is booked as a bus load so the step ledger closes
      return o.demands_w[k] - pe;
    },
    apply(k, soc, mode, pe, out) {
      finishBattery(out, battery, soc, this.drive(k, soc, mode, pe, out), 1);
    },
  };
}
