export { StrategyComparison } from "./strategy-comparison";
export { StrategyComparisonRunner } from "./strategy-comparison-runner";
