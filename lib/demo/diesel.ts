// Van A: the diesel baseline the other three architectures are measured against.
import * as Y from "yjs";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { bodyNote, CYCLE_LABELS, DEMO_CAUTION, DIESEL_FUEL, DIESEL_FUEL_NOTE, driveCycleNote, driveCycleParams, parametersNote, vanBody, vanParameters, type DemoCycle } from "./van";

/** 6-speed manual van gearbox (invented for the demo); the parallel hybrid keeps it. */
export const VAN_GEARBOX: Record<string, string> = {
  gear_ratios: "4.17, 2.23, 1.36, 1.00, 0.82, 0.68",
  final_drive_ratio: "4.1",
  efficiency: "0.94",
  upshift_speeds: "15, 25, 40, 55, 70 km/h",
};

export const VAN_GEARBOX_NOTE = [
  "Six-speed manual gearbox and rear axle; ratios invented for the demo in the usual spread of a van box (4.2 down to an overdrive 0.68).",
  "Efficiency 0.94 for gearbox and axle together (common practice, no source).",
  "Shift schedule: an early-shifting delivery driver. With the 0.345 m wheel, each gear starts at roughly 1,050–1,500 rpm and ends near 1,700–2,000 rpm; 6th at 120 km/h is about 2,570 rpm.",
].join("\n");

/** 2.2 L common-rail diesel, 120 kW at 3,500 rpm, 370 N·m from 1,500 to 2,500 rpm (invented for the demo). */
export const DIESEL_22: Record<string, string> = {
  displacement: "2.2 L",
  willans_efficiency: "0.45",
  friction_mep: "1.5 bar",
  idle_speed: "800 rpm",
  max_speed: "4200 rpm",
  full_load_speeds: "800, 1000, 1250, 1500, 2500, 3000, 3500, 4000, 4200 rpm",
  full_load_torques: "170, 240, 320, 370, 370, 355, 327, 275, 240 N·m",
  ...DIESEL_FUEL,
};

export const DIESEL_22_NOTE = [
  "2.2 L four-cylinder turbo diesel, the size class of current 3.5 t vans; 120 kW and 370 N·m are invented for the demo (327 N·m × 3,500 rpm ≈ 120 kW).",
  "Full-load curve: low torque at idle (the turbocharger has no boost yet), a plateau from 1,500 to 2,500 rpm, then constant power falling off towards the 4,200 rpm limit.",
  "Willans line: e = 0.45 and p_me0 = 1.5 bar, at the cautious ends of the diesel ranges e 0.45–0.50 and p_me0 0.7–1.5 bar (REFERENCES.md, from memory): a van engine calibrated for emissions (exhaust-gas recirculation) more than for best efficiency, with pumping, the high-pressure fuel pump and the vacuum pump counted as friction. A constant e gives the part-load penalty through friction only; a measured map is usually worse at very low load, so the figures lean optimistic.",
  DIESEL_FUEL_NOTE,
].join("\n");

export function buildDieselVan(cycle: DemoCycle, name: string): Y.Doc {
  return createScenarioDoc("conventional", name, new Y.Doc(), {
    params: {
      parameters: vanParameters(2250),
      drive_cycle: driveCycleParams(cycle),
      body: vanBody(0.06, 1000),
      driveline: VAN_GEARBOX,
      engine: DIESEL_22,
    },
    notes: {
      note: [
        `Van A, diesel baseline, on the ${CYCLE_LABELS[cycle]}. A fictional 3.5 t high-roof panel van (about 11 m³ load space) as it is sold today: 2.2 L diesel, six-speed manual, rear-wheel drive.`,
        "The concept team's question: which of four architectures (this diesel, a parallel hybrid, a series range extender, a battery-electric van) best suits the parcel rounds of an urban fleet? The other three documents keep this body, tyres, payload and cycle, so their figures differ only by the powertrain.",
        DEMO_CAUTION,
      ].join("\n"),
      parameters: parametersNote("2,250 kg, a high-roof 3.5 t diesel van with a 70 L tank, invented for the demo."),
      drive_cycle: driveCycleNote(cycle),
      body: bodyNote(
        "0.06: wheels, axle, propeller shaft, gearbox and flywheel (invented for the demo; in v1 the factor does not change with the gear).",
        "1,000 W mechanical on the engine shaft: about 600 W electrical (lights, cab blower, telematics, hand-scanner chargers; invented for the demo) through an alternator at about 60 % (common practice, no source). No air conditioning or heating.",
      ),
      driveline: VAN_GEARBOX_NOTE,
      engine: DIESEL_22_NOTE,
    },
  });
}
