import { describe, expect, it } from "vitest";
import { S_FUEL_W, S_SOC_NEXT, S_VIOLATIONS, newStepScratch } from "@/lib/engine/step-output";
import { buildCandidateTables } from "@/lib/engine/strategies/dp/tables";
import { BatteryStep } from "@/lib/engine/strategies/dp/battery-step";
import { operatingRegions } from "@/lib/engine/strategies/regions";
import { runEcms } from "@/lib/engine/strategies/equivalence";
import { example, parsed } from "../helpers";
import { tinyPlant } from "./tiny";

// Identity (no outside source needed): ECMS and DP score candidates on per-cycle tables plus
// the battery step; that must be the plant's exact step model (plants/common.ts) at any SOC,
// including regeneration curtailed by the charge limit and every limit check.
describe("candidate tables + battery step = the plant's exact step", () => {
  for (const pt of ["parallel", "series"] as const) {
    it(`${pt}: next SOC, fuel and eligibility agree with plant.apply at many SOCs`, () => {
      const s = parsed({ ...example(pt), cycle: { standard: "ece15" } });
      const plant = tinyPlant(s);
      const t = buildCandidateTables(plant, 11);
      const bs = new BatteryStep(plant.battery, plant.demand.dt_s);
      const out = newStepScratch();
      const ctl = new Float64Array(2);
      let checked = 0, eligible = 0;
      for (let k = 0; k < plant.demand.n; k += 3) {
        for (const soc of [plant.battery.socMin, 0.45, 0.6, 0.7999, plant.battery.socMax]) {
          const u = plant.battery.ocv_v(soc);
          const cl = plant.battery.chargeLimit_w(soc, 1);
          for (let slot = t.start[k]; slot < t.start[k + 1]; slot++) {
            plant.candidate(k, t.index[slot], 11, ctl);
            plant.apply(k, soc, ctl[0], ctl[1], out);
            const p = t.braking[k] ? BatteryStep.brakingBus(t.bus_w[slot], t.busOther_w[slot], cl) : t.bus_w[slot];
            const i = bs.current_a(u, plant.battery.maxPower_w(u), p);
            const next = i === Infinity ? -1 : bs.next(soc, i);
            const ok = out[S_VIOLATIONS] === 0;
            expect(next >= 0, `k=${k} soc=${soc} slot=${slot}`).toBe(ok);
            if (ok) {
              eligible++;
              expect(next).toBeCloseTo(out[S_SOC_NEXT], 12);
              expect(t.fuel_w[slot]).toBe(out[S_FUEL_W]);
            }
            checked++;
          }
        }
      }
      expect(eligible).toBeGreaterThan(100);
      expect(checked).toBeGreaterThan(eligible);
    });
  }
});

describe("operating regions", () => {
  it("partition the cycle and electric-drive time is traction with the engine off", () => {
    const s = parsed({ ...example("parallel"), cycle: { standard: "nedc" } });
    const plant = tinyPlant(s);
    const run = runEcms(plant, buildCandidateTables(plant, 21), 2.8);
    const r = operatingRegions(plant.demand, run, false);
    const total = Object.values(r).reduce((a, b) => a + b, 0);
    expect(total).toBe(1180); // NEDC duration, UNECE R83 Annex 4a
    let electric = 0;
    for (let k = 0; k < plant.demand.n; k++) if (plant.demand.wheel_w[k] > 0 && plant.demand.moving[k] && run.traces.engine_on[k] === 0) electric++;
    expect(r.electric_s).toBe(electric);
    // Standstill time of the rebuilt NEDC: 4 × (11 + 21 + 21 + 7) + 20 + 20 = 280 s of idle in R83's tables.
    expect(r.standstill_s).toBe(280);
  });
});
