/**
 * Joulebook quasi-static energy engine: pure TypeScript, no I/O. See docs/engine.md.
 */
export { evaluateScenarioInput, evaluateScenario, type EvaluateOutcome, type EvaluateOptions } from "./evaluate";
export { parseScenario, migrateScenario, CURRENT_FORMAT, type ParseOutcome, type ScenarioError } from "./scenario";
export type { Scenario, ScenarioInput, Powertrain, StrategyKind } from "./scenario";
export type { Result, Kpi, Traces } from "./result";
export type { Finding } from "./findings";
export type { Ledger, LedgerKey } from "./ledger";
export { SUPPLY_KEYS, SINK_KEYS } from "./ledger";
export { prepare, buildPlant, buildCycle } from "./build";
export { simulate } from "./simulate";
export type { Plant } from "./plants/plant";
export type { Strategy } from "./strategies/strategy";
export { cycleStats, buildStandardCycle, buildCustomCycle } from "./cycles";
