"use client";
// Chart result views: energy flow, traces, engine operating points, and the strategy comparison
// placeholder for documents that already carry that block.
import { useMemo } from "react";
import type { Result } from "@/lib/engine";
import { distinctPoints, flowRows, fullLoadCurve, operatingPoints, tracePanels, type PointCell, type TracePanelData } from "@/lib/client/notebook/chart-data";
import { Chart } from "@/components/charts/chart";
import { ENERGY_FLOW_SPEC, OPERATING_POINTS_SPEC, SERIES_DOMAIN, SERIES_RANGE, tracePanelSpec } from "@/components/charts/specs";
import { ColorKey } from "@/components/charts/color-key";
import { FUEL, INK } from "@/components/charts/theme";
import { WithResult } from "./result-state";
import { GroupLegend } from "@/components/charts/group-legend";
import { useEvaluationState } from "./notebook-context";
import { StrategyComparisonRunner } from "@/components/strategy";

export function EnergyFlow() {
  return <WithResult>{(r) => <FlowBody result={r} />}</WithResult>;
}

function FlowBody({ result }: { result: Result }) {
  const datasets = useMemo(() => ({ flow: flowRows(result) }), [result]);
  return (
    <>
      <p className="mb-2 text-sm text-muted">Energy in (left) and where it went (right), kWh over the cycle; equal heights are the ledger closing.</p>
      <Chart spec={ENERGY_FLOW_SPEC} datasets={datasets} label="Energy flow from sources to road work and losses" />
      <GroupLegend groups={Array.from(new Set(datasets.flow.map((r) => r.group)))} />
    </>
  );
}

export function Traces() {
  return <WithResult>{(r) => <TracesBody result={r} />}</WithResult>;
}

/**
 * Small multiples, one chart per quantity, stacked: each panel has its title and (for more than
 * one series) its colour key in HTML, so neither can be clipped by the chart's own layout.
 */
function TracesBody({ result }: { result: Result }) {
  const panels = useMemo(() => tracePanels(result), [result]);
  return (
    <div className="space-y-3" role="group" aria-label="Traces over the cycle: speed, power split, SOC, gear">
      {panels.map((p, i) => <TracePanel key={p.id} panel={p} last={i === panels.length - 1} />)}
    </div>
  );
}

function TracePanel({ panel, last }: { panel: TracePanelData; last: boolean }) {
  // The spec follows the panel kind and position only, never the values.
  const spec = useMemo(() => tracePanelSpec(panel.kind, last), [panel.kind, last]);
  const datasets = useMemo(() => ({ rows: panel.rows }), [panel.rows]);
  const key = useMemo(() => panel.series.map((s) => ({ label: s, color: SERIES_RANGE[SERIES_DOMAIN.indexOf(s)] ?? "currentColor" })), [panel.series]);
  return (
    <section data-trace={panel.kind}>
      <h4 className="text-xs font-semibold text-ink">{panel.title}</h4>
      <Chart spec={spec} datasets={datasets} label={`${panel.title} over the cycle`} />
      {panel.series.length > 1 ? <ColorKey items={key} label={`Colour key: ${panel.title}`} /> : null}
    </section>
  );
}

export function OperatingPoints() {
  return <WithResult>{(r) => <PointsBody result={r} />}</WithResult>;
}

function PointsBody({ result }: { result: Result }) {
  const points = useMemo(() => operatingPoints(result), [result]);
  const datasets = useMemo(() => ({ points: distinctPoints(points), curve: fullLoadCurve(result) }), [points, result]);
  if (!result.curves.engine_full_load) {
    return <p className="text-sm text-muted">No operating points: this powertrain has no engine. The electric machine's figures are in the loss ledger and the traces.</p>;
  }
  return (
    <>
      <p className="mb-2 text-sm text-muted">{pointsCaption(points.length, datasets.points)}</p>
      <Chart spec={OPERATING_POINTS_SPEC} datasets={datasets} label="Engine operating points over the full-load curve" />
      <ColorKey items={POINTS_KEY} label="Colour key: operating points" />
    </>
  );
}

function pointsCaption(steps: number, cells: readonly PointCell[]): string {
  if (steps === 0) return "The engine did not run on this cycle, so there are no operating points; the line is the full-load torque curve.";
  const n = `${steps.toLocaleString("en-GB")} step${steps === 1 ? "" : "s"}`;
  // a few fixed points (a genset's thermostat) sit on the curve: say where they are
  if (cells.length <= 3) {
    const where = cells.map((p) => `${p.speed_rpm.toLocaleString("en-GB")} rpm and ${p.torque_nm} N·m`).join("; ");
    return `The engine ran ${n}, all at ${cells.length === 1 ? "one operating point" : `${cells.length} operating points`} (${where}); the line is the full-load torque curve.`;
  }
  return `Where the engine ran (${n}): a dot's area grows with the steps spent at that point; the line is the full-load torque curve.`;
}

const POINTS_KEY = [{ label: "engine running (area: steps at the point)", color: FUEL, shape: "dot" as const }, { label: "full-load torque", color: INK }];

/** Rule vs ECMS vs DP on the current scenario, run on demand in its own worker (components/strategy). */
export function StrategyComparison() {
  const evaluation = useEvaluationState();
  return <StrategyComparisonRunner scenario={evaluation.stale ? null : evaluation.scenario} />;
}
