export { parseScenario, type ParseOutcome } from "./parse";
export { migrateScenario, CURRENT_FORMAT } from "./migrate";
export type { ScenarioError } from "./errors";
export * from "./schema";
