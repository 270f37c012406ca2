// Van B: parallel hybrid. The diesel baseline's engine and gearbox with a motor between clutch and gearbox.
import * as Y from "yjs";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { DIESEL_22, DIESEL_22_NOTE, VAN_GEARBOX, VAN_GEARBOX_NOTE } from "./diesel";
import { bodyNote, CYCLE_LABELS, DEMO_CAUTION, driveCycleNote, driveCycleParams, parametersNote, vanBody, vanParameters, type DemoCycle } from "./van";

/** Rule settings per cycle: tuned so each run ends within ±1 % SOC of its start (see the note). */
export const PARALLEL_RULE: Record<DemoCycle, { electric_speed_max: string; charge_power: string }> = {
  route: { electric_speed_max: "30 km/h", charge_power: "6.5 kW" },
  nedc: { electric_speed_max: "35 km/h", charge_power: "1.5 kW" },
};

const MOTOR: Record<string, string> = { peak_power: "40 kW", peak_torque: "220 N·m", max_speed: "6000 rpm", efficiency: "0.91" };

const BATTERY: Record<string, string> = {
  capacity: "12 Ah",
  ocv_soc: "0, 0.1, 0.5, 0.9, 1",
  ocv_voltage: "255, 272, 290, 305, 315 V",
  resistance: "0.10 Ω",
  soc_initial: "0.55",
  soc_min: "0.30",
  soc_max: "0.80",
  max_discharge_c: "20 C",
  max_charge_c: "15 C",
};

// Why each cycle has its own rule settings (the tests check the outcome, not these words).
const TUNING_NOTE: Record<DemoCycle, string> = {
  route:
    "Tuning on the route: the district hops (27–36 km/h) run electric up to 30 km/h, then the diesel takes over. With the engine's default charging (1 kW) the pack drains by several % SOC per round; we raised the charge power until the round ends within ±1 % SOC of its start (6.5 kW). The same settings are not charge-sustaining on the NEDC; see the NEDC document.",
  nedc:
    "Tuning on the NEDC: with the route's settings (30 km/h, 6.5 kW) the pack gains several % SOC, because the ECE hops at 32 and 35 km/h run on the diesel, which then charges, and the EUDC stop recuperates a lot. Electric drive up to 35 km/h and 1.5 kW of charging end the cycle within ±1 % SOC of its start. A rule tuned on one cycle is rarely charge-sustaining on another; ECMS with SOC feedback adapts by itself.",
};

function energyManager(cycle: DemoCycle): Record<string, string> {
  const rule = PARALLEL_RULE[cycle];
  return {
    kind: "rule",
    electric_speed_max: rule.electric_speed_max,
    soc_low: "0.45",
    soc_high: "0.65",
    charge_power: rule.charge_power,
    // ready for a switch to ECMS or DP: target and window around the initial SOC
    equivalence_factor: "2.5",
    soc_feedback_gain: "5",
    soc_target: "0.55",
    soc_final_min: "0.55",
    soc_final_max: "0.56",
  };
}

export function buildParallelVan(cycle: DemoCycle, name: string): Y.Doc {
  const rule = PARALLEL_RULE[cycle];
  return createScenarioDoc("parallel", name, new Y.Doc(), {
    params: {
      parameters: vanParameters(2370),
      drive_cycle: driveCycleParams(cycle),
      body: vanBody(0.065, 700),
      driveline: VAN_GEARBOX,
      engine: DIESEL_22,
      electric_machine: MOTOR,
      battery_pack: BATTERY,
      energy_manager: energyManager(cycle),
    },
    notes: {
      note: [
        `Van B, parallel hybrid, on the ${CYCLE_LABELS[cycle]}. Van A's 2.2 L diesel and six-speed gearbox, with a 40 kW motor on the gearbox input shaft (between clutch and gearbox) and a 3.5 kWh pack. The engine is unchanged so that the saving shows what the electric path alone buys.`,
        "Where the saving comes from: the van brakes to a standstill about 27 times per round; a stop from 45 km/h carries some 0.07 kWh of kinetic energy that Van A turns into brake heat. Electric launches also keep the diesel out of its worst region (low load, low speed).",
        DEMO_CAUTION,
      ].join("\n"),
      parameters: parametersNote("2,370 kg: Van A plus about 120 kg for the motor, inverter, 3.5 kWh pack, DC/DC converter and cabling (invented for the demo)."),
      drive_cycle: driveCycleNote(cycle),
      body: bodyNote(
        "0.065: Van A's 0.06 plus the motor's rotor on the gearbox input shaft (invented for the demo).",
        "700 W electrical from the traction battery through the DC/DC converter: the same 600 W of loads as Van A at about 90 % converter efficiency (common practice, no source); no belt alternator.",
      ),
      driveline: VAN_GEARBOX_NOTE,
      engine: DIESEL_22_NOTE,
      electric_machine: [
        "40 kW, 220 N·m permanent-magnet motor between clutch and gearbox; it turns at engine speed whenever the clutch is closed, so its speed limit (6,000 rpm) sits above the diesel's 4,200 rpm. Invented for the demo.",
        "Sizing: 40 kW recovers most of a stop from 45 km/h at 1.25 m/s² (about 3.1 t × 1.25 m/s² × 12.5 m/s ≈ 48 kW at the wheels at the start of the stop, falling to zero) and launches the van electrically to 30 km/h; more would mostly add cost and mass.",
        "Efficiency 0.91 for motor and inverter together, constant (v1 has no efficiency maps).",
      ].join("\n"),
      battery_pack: [
        "3.5 kWh (12 Ah at about 290 V), a power-oriented pack: 80 cells in series of 12 Ah (invented for the demo). The OCV curve is a generic flat middle with steeper ends (invented for the demo).",
        "Window 0.30–0.80 (1.75 kWh usable), start at 0.55 in the middle. Charge limit 15 C = 180 A ≈ 52 kW, above the motor's 40 kW, so the motor is the limit when recuperating.",
        "Pack resistance 0.10 Ω (invented for the demo): at the full 40 kW about 2.1 kW is lost in the cells.",
        "Battery current, voltage and temperature limits come from the cell maker's data and the applicable safety standards, not from this tool.",
      ].join("\n"),
      energy_manager: [
        `Rule-based (the engine's parallel rule, docs/engine.md): electric drive up to ${rule.electric_speed_max} when the SOC is above 0.45 and the motor and battery can carry the demand; otherwise the diesel drives, boosted by the motor when its full-load torque is short, and below SOC 0.65 it also charges the pack with up to ${rule.charge_power} (load-point shift), scaled down as the SOC approaches 0.65.`,
        TUNING_NOTE[cycle],
        "ECMS (s0 2.5, k 5, target 0.55) and DP (final SOC 0.55–0.56) are prefilled for a switch; the Strategy comparison block runs all three and shows how far the rule is from the DP lower bound. Expect ECMS to land close to DP here: with a constant-efficiency motor and a Willans engine the fuel is nearly affine in the split, so the rule's loss is mostly in when it runs the engine, not how hard.",
      ].join("\n"),
    },
  });
}
