/**
 * What the four demo van documents share: the vehicle, the tyres, the drive cycle block and the
 * diesel fuel. Values are for a fictional 3.5 t high-roof panel van; "invented for the demo"
 * marks a value we chose, not one taken from a data sheet.
 */
import { DELIVERY_ROUTE, routeFigures, routeSpeedsText, sampleRoute } from "./delivery-route";

export type DemoCycle = "route" | "nedc";

export const CYCLE_LABELS: Record<DemoCycle, string> = { route: "delivery route", nedc: "NEDC" };

const route = sampleRoute(DELIVERY_ROUTE);
const figures = routeFigures(route);
const speedsText = routeSpeedsText(route);

/** The route as list text for a drive cycle block (exported for tests and the seed). */
export const DELIVERY_ROUTE_SPEEDS_TEXT = speedsText;

/** Parameters block: masses and the tyre size. Only kerb mass differs between architectures. */
export function vanParameters(curbMass_kg: number): Record<string, string> {
  return {
    curb_mass: `${curbMass_kg} kg`,
    driver: "80 kg",
    payload: "700 kg",
    tyre_width: "235 mm",
    tyre_aspect: "0.65",
    rim_diameter: "16 * 25.4 mm",
  };
}

export function parametersNote(curbNote: string): string {
  return [
    `curb_mass: ${curbNote}`,
    "driver: one driver, no crew mate (invented for the demo).",
    "payload: about 1,000 kg of parcels leave the depot and about 400 kg comes back (returns, undelivered, empty cages); the model has one mass, so we use the mean, 700 kg (invented for the demo). The same payload in every architecture, so the four documents do the same work.",
    "Tyres 235/65 R16 C, a common light-commercial size (invented for the demo); the wheel radius in Body & road load is computed from them.",
  ].join("\n");
}

/** Body & road load: the same high-roof body for every architecture. */
export function vanBody(rotatingMassFactor: number, aux_w: number): Record<string, string> {
  return {
    mass: "curb_mass + driver + payload",
    rotating_mass_factor: String(rotatingMassFactor),
    drag_coefficient: "0.37",
    frontal_area: "4.7 m²",
    rolling_resistance: "0.010",
    // 3 % of the unloaded radius lost to tyre deflection under load (common practice, no source)
    wheel_radius: "0.97 * (rim_diameter / 2 + tyre_aspect * tyre_width)",
    air_density: "1.2 kg/m³",
    gravity: "9.81 m/s²",
    aux_power: `${aux_w} W`,
  };
}

export function bodyNote(rotatingNote: string, auxNote: string): string {
  return [
    "Test mass = kerb + driver + mean payload (Parameters): 3.0–3.5 t, close to the 3.5 t gross limit.",
    "Drag: a high-roof panel van is a box; c_d 0.37 and A 4.7 m² (about 2.05 m wide × 2.55 m high, less the gaps under the body) are invented for the demo, in the range we remember for such vans (from memory). Passenger cars sit at c_d 0.25–0.35 and A 2.0–2.5 m² (REFERENCES.md, from memory): the van's c_d·A of about 1.74 m² is about 2.6 times that of a car with 0.66 m², which is why the ring-road stretch costs so much.",
    "Rolling resistance 0.010: C-type (light-commercial) tyres, well inflated, laden, on town asphalt with its patches and kerbside gutters; invented for the demo at the low end of the 0.010–0.015 we remember for car tyres on asphalt (REFERENCES.md, from memory). Label-class tyres measured on a test drum do better (the best EU-label class for car tyres is ≤ 6.5 N/kN, Reg. (EU) 2020/740); a reviewer may ask why we did not take 0.007–0.008.",
    "Wheel radius: unloaded radius of a 235/65 R16 tyre (rim/2 + 65 % of 235 mm = 356 mm) less 3 % for deflection (common practice, no source): about 0.345 m.",
    `Rotating mass factor: ${rotatingNote}`,
    `Auxiliary load: ${auxNote}`,
    "Air density 1.2 kg/m³ and g = 9.81 m/s² are the product defaults (ISA sea level is 1.225 kg/m³, ISO 2533).",
  ].join("\n");
}

/** Drive cycle block: the route as own samples; the NEDC stays selected under "Standard cycle". */
export function driveCycleParams(cycle: DemoCycle): Record<string, string> {
  return { source: cycle === "route" ? "custom" : "standard", standard: "nedc", dt: "1 s", speeds: speedsText, grade: "" };
}

export function driveCycleNote(cycle: DemoCycle): string {
  const km = figures.distance_km.toFixed(2);
  const route = [
    `Harbour district parcel round, a route of our own (invented for the demo; generator in lib/demo/delivery-route.ts): ${figures.duration_s} s at 1 Hz, ${km} km, ${figures.stops} stops, top ${figures.max_kmh} km/h, mean ${figures.mean_kmh.toFixed(1)} km/h.`,
    "Depot yard → arterial road with traffic lights (45 km/h) → a short ring-road stretch at 81 km/h → twelve drops in the delivery district (27–36 km/h hops, some with a junction stop) → back the same way.",
    "Phases are accelerate / cruise / decelerate / dwell with stated rates: launches 0.625–1.25 m/s², stops at 1.25 m/s², ring-road merge 0.5 then 0.25 m/s². Flat road.",
    "Drop dwells are short doorstep hand-overs (30–50 s) with the engine running. Longer drops, where the driver switches off, are left out: the model idles the engine whenever the van stands.",
  ];
  const both = `Why two cycles: the route is the fleet's question (what does this van use on our work?), the NEDC (UNECE R83, rebuilt from its operation tables) is the figure everyone can compare against. Every architecture has one document per cycle. The two differ in Drive cycle › source (own speed samples = route, standard cycle = NEDC) and, where a hybrid strategy had to be retuned to stay charge-sustaining, in the Energy manager; switching the source in either document moves it to the other cycle.`;
  const lead = cycle === "route" ? "This document runs the delivery route." : "This document runs the NEDC (the route's samples stay in the block, unused).";
  return [lead, ...route, both].join("\n");
}

/** Diesel as the engine block writes it, with the sources of each value. */
export const DIESEL_FUEL: Record<string, string> = { fuel_lhv: "43.1 MJ/kg", fuel_density: "0.832 kg/L", fuel_co2: "2.64 kg/L" };

export const DIESEL_FUEL_NOTE = [
  "Fuel: EN 590 diesel. Lower heating value 43.1 MJ/kg and density 0.832 kg/L: JEC well-to-wheels report v4a (2014), from memory (REFERENCES.md); EN 590 allows 0.820–0.845 kg/L.",
  "CO2 2.64 kg per litre: the EU carbon-balance equivalent of UNECE R101 for diesel (≈ 2.64 kg/L at 0.835 kg/L). The US EPA figure (EPA-420-F-11-041) is 2.689 kg/L, 2 % higher; tank-to-wheel only.",
].join("\n");

export const DEMO_CAUTION =
  "Concept-stage estimates on a quasi-static model, not type-approval or certification figures. Every value marked 'invented for the demo' is a placeholder for the team's own data.";
