// The electric drive shared by Van C (range extender) and Van D (battery-electric): one e-axle
// for both keeps the comparison about the energy source, not the motor.

/** 120 kW, 300 N·m permanent-magnet motor with inverter (invented for the demo). */
export const E_AXLE_MOTOR: Record<string, string> = { peak_power: "120 kW", peak_torque: "300 N·m", max_speed: "12000 rpm", efficiency: "0.91" };

/** One fixed reduction in the rear axle (invented for the demo). */
export const E_AXLE_REDUCTION: Record<string, string> = { gear_ratios: "1", final_drive_ratio: "10.5", efficiency: "0.97", upshift_speeds: "" };

export const E_AXLE_MOTOR_NOTE = [
  "120 kW, 300 N·m permanent-magnet motor with inverter, driving the rear axle (invented for the demo). The same e-axle as the other electric van of the study, so the two differ only in where the energy comes from.",
  "Sizing: the diesel baseline's 120 kW keeps the laden van's ring-road merge and motorway speed; 300 N·m through 10.5:1 gives about 8.9 kN at the wheels, 2.5 m/s² at 3.5 t, far more than the route's 1.25 m/s² launches, so torque is never the limit. 12,000 rpm is about 150 km/h.",
  "Efficiency 0.91 for motor and inverter together, constant (v1 has no efficiency maps); it is optimistic at very low load and pessimistic at the best point.",
].join("\n");

export const E_AXLE_REDUCTION_NOTE =
  "Single reduction 10.5:1 with 97 % efficiency for gears and bearings (common practice, no source; invented for the demo). No gearbox: the motor covers 0–150 km/h.";
