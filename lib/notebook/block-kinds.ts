/** Block kinds of a scenario document and their product titles (ours, DESIGN §7). */
export const BLOCK_KINDS = [
  "drive_cycle", "body", "driveline", "engine", "electric_machine", "generator_set", "battery_pack",
  "energy_manager", "parameters", "note",
  "headline_figures", "loss_ledger", "energy_flow", "traces", "operating_points", "strategy_comparison",
] as const;

export type BlockKind = (typeof BLOCK_KINDS)[number];

export const BLOCK_TITLES: Record<BlockKind, string> = {
  drive_cycle: "Drive cycle",
  body: "Body & road load",
  driveline: "Driveline",
  engine: "Engine",
  electric_machine: "Electric machine",
  generator_set: "Generator set",
  battery_pack: "Battery pack",
  energy_manager: "Energy manager",
  parameters: "Parameters",
  note: "Note",
  headline_figures: "Headline figures",
  loss_ledger: "Loss ledger",
  energy_flow: "Energy flow",
  traces: "Traces",
  operating_points: "Operating points",
  strategy_comparison: "Strategy comparison",
};

/** Kinds that only display results; they carry no scenario fields. */
export const RESULT_VIEW_KINDS: readonly BlockKind[] = [
  "headline_figures", "loss_ledger", "energy_flow", "traces", "operating_points", "strategy_comparison",
];

/** Kinds that map to one part of the Scenario: at most one of each per document. */
export const COMPONENT_KINDS: readonly BlockKind[] = [
  "drive_cycle", "body", "driveline", "engine", "electric_machine", "generator_set", "battery_pack", "energy_manager",
];

export function isBlockKind(x: unknown): x is BlockKind {
  return typeof x === "string" && (BLOCK_KINDS as readonly string[]).includes(x);
}

export const POWERTRAINS = ["conventional", "bev", "parallel", "series"] as const;
export type PowertrainKind = (typeof POWERTRAINS)[number];

export const POWERTRAIN_LABELS: Record<PowertrainKind, string> = {
  conventional: "conventional",
  bev: "battery-electric",
  parallel: "parallel hybrid",
  series: "series hybrid",
};

/** Component blocks each powertrain needs (besides drive cycle, body and driveline). */
export const REQUIRED_KINDS: Record<PowertrainKind, readonly BlockKind[]> = {
  conventional: ["drive_cycle", "body", "driveline", "engine"],
  bev: ["drive_cycle", "body", "driveline", "electric_machine", "battery_pack"],
  parallel: ["drive_cycle", "body", "driveline", "engine", "electric_machine", "battery_pack", "energy_manager"],
  series: ["drive_cycle", "body", "driveline", "engine", "electric_machine", "generator_set", "battery_pack", "energy_manager"],
};

/** Strategies each powertrain accepts (lib/engine/scenario/rules.ts agrees). */
export const STRATEGY_KINDS: Record<PowertrainKind, readonly string[]> = {
  conventional: [],
  bev: [],
  parallel: ["rule", "ecms", "dp"],
  series: ["thermostat", "ecms", "dp"],
};
