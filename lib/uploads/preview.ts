import { checkText, decodeUpload } from "./decode";
import { issue, type UploadIssue } from "./issues";
import { proposeCycle, type CycleProposal } from "./cycle-proposal";
import { parseCycle, type UploadedCycle } from "./cycle-parse";
import { proposeFullLoad, proposeOcv, type FullLoadProposal, type OcvProposal } from "./component-proposal";
import { parseFullLoad, parseOcv, type FullLoadCurve, type OcvCurve } from "./component-parse";
import { referenceStats } from "./cycle-stats";
import { recognizeCycle, type Recognition } from "./recognize";
import type { CycleConfirmation, FullLoadConfirmation, OcvConfirmation } from "./confirmation";
import type { CycleStats } from "@/lib/engine/cycles";

export type UploadInput = { bytes: Uint8Array } | { text: string };

export type CyclePreview =
  | { ok: true; proposal: CycleProposal; confirmation: CycleConfirmation; cycle: UploadedCycle; stats: CycleStats; recognition: Recognition; warnings: string[] }
  | { ok: false; proposal: CycleProposal | null; confirmation: CycleConfirmation | null; issues: UploadIssue[] };

export type ComponentPreview<P, C, D> =
  | { ok: true; proposal: P; confirmation: C; data: D; warnings: string[] }
  | { ok: false; proposal: P | null; confirmation: C | null; issues: UploadIssue[] };

function textOf(input: UploadInput) {
  return "bytes" in input ? decodeUpload(input.bytes) : checkText(input.text);
}

const layoutOf = (p: { layout: { delimiter: CycleConfirmation["delimiter"]; decimal: "." | ","; header_rows: 0 | 1 | 2 } }) =>
  ({ delimiter: p.layout.delimiter, decimal: p.layout.decimal, header_rows: p.layout.header_rows });

/** The confirmation the proposal stands for, or the issue that keeps it from being one. */
export function cycleConfirmationOf(p: CycleProposal): CycleConfirmation | UploadIssue {
  if (!p.speed) {
    const names = p.layout.headers.map((h) => `"${h}"`).join(", ");
    return issue(`no column looks like a speed (columns: ${names}); name it e.g. "speed [km/h]" or choose the speed column`, 1);
  }
  return { ...layoutOf(p), time: p.time, speed: p.speed, grade: p.grade, sample_dt_s: p.sample_dt_s, dt_s: null };
}

/** Proposal, then a parse with the user's confirmation (or the proposal itself), statistics and recognition. Nothing is stored. */
export function previewCycle(input: UploadInput, confirmation?: CycleConfirmation): CyclePreview {
  const decoded = textOf(input);
  if (!decoded.ok) return { ok: false, proposal: null, confirmation: null, issues: decoded.issues };
  const { proposal } = proposeCycle(decoded.text);
  const conf = confirmation ?? cycleConfirmationOf(proposal);
  if ("message" in conf) return { ok: false, proposal, confirmation: null, issues: [conf] };
  const parsed = parseCycle(decoded.text, conf);
  if (!parsed.ok) return { ok: false, proposal, confirmation: conf, issues: parsed.issues };
  const c = parsed.value;
  return {
    ok: true, proposal, confirmation: conf, cycle: c, warnings: parsed.warnings,
    stats: referenceStats(c.dt_s, c.speed_kmh, c.grade_pct), recognition: recognizeCycle(c.dt_s, c.speed_kmh),
  };
}

export function previewFullLoad(input: UploadInput, confirmation?: FullLoadConfirmation): ComponentPreview<FullLoadProposal, FullLoadConfirmation, FullLoadCurve> {
  const decoded = textOf(input);
  if (!decoded.ok) return { ok: false, proposal: null, confirmation: null, issues: decoded.issues };
  const { proposal } = proposeFullLoad(decoded.text);
  let conf = confirmation;
  if (!conf) {
    if (!proposal.speed || !proposal.torque)
      return { ok: false, proposal, confirmation: null, issues: [issue(`no ${!proposal.speed ? "speed" : "torque"} column found; name the columns e.g. "speed [rpm]" and "torque [N·m]" or choose them`, 1)] };
    conf = { ...layoutOf(proposal), speed: proposal.speed, torque: proposal.torque };
  }
  const parsed = parseFullLoad(decoded.text, conf);
  return parsed.ok ? { ok: true, proposal, confirmation: conf, data: parsed.value, warnings: parsed.warnings } : { ok: false, proposal, confirmation: conf, issues: parsed.issues };
}

export function previewOcv(input: UploadInput, confirmation?: OcvConfirmation): ComponentPreview<OcvProposal, OcvConfirmation, OcvCurve> {
  const decoded = textOf(input);
  if (!decoded.ok) return { ok: false, proposal: null, confirmation: null, issues: decoded.issues };
  const { proposal } = proposeOcv(decoded.text);
  let conf = confirmation;
  if (!conf) {
    if (!proposal.soc || !proposal.voltage)
      return { ok: false, proposal, confirmation: null, issues: [issue(`no ${!proposal.soc ? "SOC" : "voltage"} column found; name the columns e.g. "soc [%]" and "voltage [V]" or choose them`, 1)] };
    conf = { ...layoutOf(proposal), soc: proposal.soc, voltage: proposal.voltage };
  }
  const parsed = parseOcv(decoded.text, conf);
  return parsed.ok ? { ok: true, proposal, confirmation: conf, data: parsed.value, warnings: parsed.warnings } : { ok: false, proposal, confirmation: conf, issues: parsed.issues };
}
