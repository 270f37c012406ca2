"use client";
// Chart result views: energy flow, traces, engine operating points, and the strategy comparison
// placeholder for documents that already carry that block.
import { useMemo } from "react";
import type { Result } from "@/lib/engine";
import { flowRows, fullLoadCurve, operatingPoints, tracePanels, type TracePanelData } from "@/lib/client/notebook/chart-data";
import { Chart } from "@/components/charts/chart";
import { ENERGY_FLOW_SPEC, OPERATING_POINTS_SPEC, SERIES_DOMAIN, SERIES_RANGE, tracePanelSpec } from "@/components/charts/specs";
import { ColorKey } from "@/components/charts/color-key";
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
  const datasets = useMemo(() => ({ points: operatingPoints(result), curve: fullLoadCurve(result) }), [result]);
  if (!result.curves.engine_full_load) return <p className="text-sm text-muted">This powertrain has no engine.</p>;
  return (
    <>
      <p className="mb-2 text-sm text-muted">Each dot is one step with the engine running; the line is the full-load torque curve.</p>
      <Chart spec={OPERATING_POINTS_SPEC} datasets={datasets} label="Engine operating points over the full-load curve" />
    </>
  );
}

/** Rule vs ECMS vs DP on the current scenario, run on demand in its own worker (components/strategy). */
export function StrategyComparison() {
  const evaluation = useEvaluationState();
  return <StrategyComparisonRunner scenario={evaluation.stale ? null : evaluation.scenario} />;
}
