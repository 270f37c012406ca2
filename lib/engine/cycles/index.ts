export type { Cycle } from "./cycle";
export { intervalCount } from "./cycle";
export { buildStandardCycle, buildFromOperations, operationsOf, standardCycleDuration_s, type StandardCycleName } from "./standard";
export { buildCustomCycle } from "./custom";
export { cycleStats, type CycleStats, type TractionVehicle } from "./stats";
export { ECE15_OPERATIONS, EUDC_OPERATIONS, NEDC_OPERATIONS, type Operation } from "./r83-tables";
