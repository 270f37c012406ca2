// Van D: battery-electric. The range extender's e-axle with a 90 kWh pack and no engine.
import * as Y from "yjs";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { E_AXLE_MOTOR, E_AXLE_MOTOR_NOTE, E_AXLE_REDUCTION, E_AXLE_REDUCTION_NOTE } from "./e-axle";
import { bodyNote, CYCLE_LABELS, DEMO_CAUTION, driveCycleNote, driveCycleParams, parametersNote, vanBody, vanParameters, type DemoCycle } from "./van";

const BATTERY: Record<string, string> = {
  capacity: "250 Ah",
  ocv_soc: "0, 0.1, 0.5, 0.9, 1",
  ocv_voltage: "315, 340, 360, 385, 398 V",
  resistance: "0.05 Ω",
  soc_initial: "0.90",
  soc_min: "0.10",
  soc_max: "0.95",
  max_discharge_c: "3 C",
  max_charge_c: "1 C",
};

export function buildBevVan(cycle: DemoCycle, name: string): Y.Doc {
  return createScenarioDoc("bev", name, new Y.Doc(), {
    params: {
      parameters: vanParameters(2650),
      drive_cycle: driveCycleParams(cycle),
      body: vanBody(0.05, 700),
      driveline: E_AXLE_REDUCTION,
      electric_machine: E_AXLE_MOTOR,
      battery_pack: BATTERY,
    },
    notes: {
      note: [
        `Van D, battery-electric, on the ${CYCLE_LABELS[cycle]}. The range extender's 120 kW e-axle with a 90 kWh pack, charged at the depot overnight.`,
        "The question it answers: energy per 100 km from the pack (the figure here, before charging losses) and whether a day of rounds fits in the pack with winter and ageing margins; the permissible gross mass (the pack adds about 400 kg) is a question for the homologation team, not this tool.",
        DEMO_CAUTION,
      ].join("\n"),
      parameters: parametersNote("2,650 kg: Van A without engine, gearbox, exhaust and tank (about −250 kg), with a 90 kWh pack (about 550 kg), the e-axle and power electronics (invented for the demo)."),
      drive_cycle: driveCycleNote(cycle),
      body: bodyNote(
        "0.05: wheels, e-axle rotor and reduction gears (invented for the demo).",
        "700 W electrical from the pack: the same 600 W of loads as Van A through the DC/DC converter at about 90 % (common practice, no source), plus nothing for heating or cooling the cab or the pack: a winter day would add several kW (not in this demo).",
      ),
      driveline: E_AXLE_REDUCTION_NOTE,
      electric_machine: E_AXLE_MOTOR_NOTE,
      battery_pack: [
        "90 kWh (250 Ah at about 360 V nominal), invented for the demo. Sizing: a shift of about eight rounds of the delivery route is some 120 km, roughly 30 kWh at the figures here; a winter day with cab heating, an ageing pack (80 % of its capacity late in life) and a reserve for the way home push the requirement to about twice that, and the 10–95 % window leaves 76 kWh of the 90.",
        "The round starts at 0.90 after the overnight charge. Generic OCV curve, flat in the middle (invented for the demo); resistance 0.05 Ω (about 6 kW lost at 120 kW).",
        "Limits: discharge 3 C = 750 A, far above what the motor draws; charge 1 C = 250 A ≈ 90 kW, above the motor's recuperation, so the motor is the limit when braking.",
        "Battery current, voltage and temperature limits come from the cell maker's data and the applicable safety standards, not from this tool.",
      ].join("\n"),
    },
  });
}
