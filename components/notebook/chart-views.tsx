"use client";
// Chart result views: energy flow, traces, engine operating points, and the strategy comparison
// placeholder for documents that already carry that block.
import { useMemo } from "react";
import type { Result } from "@/lib/engine";
import { flowRows, fullLoadCurve, operatingPoints, tracePanels } from "@/lib/client/notebook/chart-data";
import { Chart } from "@/components/charts/chart";
import { ENERGY_FLOW_SPEC, OPERATING_POINTS_SPEC, tracesSpec } from "@/components/charts/specs";
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

function TracesBody({ result }: { result: Result }) {
  const panels = useMemo(() => tracePanels(result), [result]);
  const layout = panels.map((p) => `${p.id}:${p.title}`).join("|");
  // The spec follows the list of panels only (i.e. the powertrain), never the values.
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const spec = useMemo(() => tracesSpec(panels.map(({ id, title }) => ({ id, title })), powerSeries(result.powertrain)), [layout]);
  const datasets = useMemo(() => Object.fromEntries(panels.map((p) => [p.id, p.rows])), [panels]);
  return <Chart key={layout} spec={spec} datasets={datasets} label="Traces over the cycle: speed, power split, SOC, gear" />;
}

/** The series of the power-split panel (the only panel with more than one line). */
function powerSeries(pt: Result["powertrain"]): string[] {
  return [...(pt !== "bev" ? ["engine"] : []), ...(pt !== "conventional" ? ["motor"] : []), ...(pt === "series" ? ["generator"] : []), "friction brakes"];
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
