"use client";
// Runs the strategy comparison for a scenario in a Web Worker (useStrategyJob), with progress
// and cancel, and shows the result. The notebook mounts this in its "Strategy comparison" block.
import type { Scenario } from "@/lib/engine";
import { useStrategyJob } from "@/lib/client/strategy/use-strategy-job";
import { Button } from "@/components/ui/button";
import { StrategyComparison } from "./strategy-comparison";

export function StrategyComparisonRunner({ scenario }: { scenario: Scenario | null }) {
  const { state, start, cancel } = useStrategyJob();
  const hybrid = scenario?.powertrain === "parallel" || scenario?.powertrain === "series";
  if (!scenario || !hybrid) {
    return <p className="text-sm text-muted">The comparison needs a parallel or series hybrid scenario without errors.</p>;
  }
  const running = state.status === "running";
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" onClick={() => start({ scenario, compare: true })} disabled={running}>
          {state.status === "done" ? "Run again" : "Compare strategies"}
        </Button>
        {running ? (
          <>
            <progress className="h-2 w-48" max={1} value={state.progress} aria-label="Comparison progress" />
            <span className="font-mono text-sm text-muted">{Math.round(state.progress * 100)} % · {state.phase}</span>
            <Button variant="ghost" onClick={cancel}>Cancel</Button>
          </>
        ) : null}
        {state.status === "cancelled" ? <span className="text-sm text-muted">Cancelled.</span> : null}
      </div>
      {state.status === "failed" ? <p role="alert" className="text-sm text-danger">The comparison failed: {state.message}</p> : null}
      {state.status === "invalid" ? (
        <ul role="alert" className="list-disc pl-5 text-sm text-danger">{state.errors.map((e) => <li key={e.path}>{e.message}</li>)}</ul>
      ) : null}
      {state.status === "done" && state.result.kind === "compare" ? <StrategyComparison comparison={state.result.comparison} /> : null}
      {state.status === "idle" ? (
        <p className="text-sm text-muted">Runs the rule-based (or thermostat) strategy, ECMS with its charge-sustaining factor and the dynamic-programming optimum on this scenario. DP takes a moment; it runs beside the page and can be cancelled.</p>
      ) : null}
    </div>
  );
}
