/** Versions, diffs and comment helpers: pure TypeScript (Yjs, notebook, engine), no I/O. */
export * from "./types";
export { diffVersions } from "./diff";
export { diffBlocks, paramChanges } from "./blocks-diff";
export { kpiDeltas, ledgerDeltas, waterfall } from "./figures-diff";
export { overlayTraces } from "./traces-diff";
export { summarizeResult, thinTraces, bucketMeans, bucketSize, TRACE_BUDGET_POINTS } from "./summary";
export { versionContent, snapshotOfState, docFromState, type VersionContent } from "./content";
export { applySnapshot, setText } from "./restore";
export { movedIds, longestCommonSubsequence } from "./lcs";
export { EvaluatedDoc, showValue, formatNumber } from "./values";
export * from "./anchors";
export * from "./markup";
export { KPI_ROWS, TRACE_LABELS, LEDGER_LABELS } from "./labels";
