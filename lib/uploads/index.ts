/** Uploads of drive cycles and component tables: detection, confirmation, validation, resampling, recognition. Pure. */
export * from "./preview";
export * from "./confirmation";
export { formatIssue, type UploadIssue } from "./issues";
export type { UploadedCycle } from "./cycle-parse";
export type { CycleProposal } from "./cycle-proposal";
export type { FullLoadProposal, OcvProposal } from "./component-proposal";
export type { FullLoadCurve, OcvCurve } from "./component-parse";
export { recognizeCycle, type Recognition } from "./recognize";
export { referenceStats, REFERENCE_CAR } from "./cycle-stats";
export { MAX_UPLOAD_BYTES, MAX_SPEED_KMH, MAX_ACCEL_M_S2 } from "./limits";
export { WLTC_3B } from "./published";
