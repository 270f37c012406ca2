"use client";
// React hook for long strategy runs in a Web Worker: start, progress, cancel, result.
import { useCallback, useEffect, useRef, useState } from "react";
import type { JobRequest, JobResult } from "@/lib/engine/jobs/runner";
import type { ScenarioError } from "@/lib/engine";
import { runStrategyJob } from "./run-job";

export type StrategyJobState =
  | { status: "idle" }
  | { status: "running"; progress: number; phase: string }
  | { status: "done"; result: JobResult }
  | { status: "invalid"; errors: ScenarioError[] }
  | { status: "cancelled" }
  | { status: "failed"; message: string };

export interface StrategyJob {
  state: StrategyJobState;
  start(request: JobRequest): void;
  cancel(): void;
}

export function useStrategyJob(): StrategyJob {
  const [state, setState] = useState<StrategyJobState>({ status: "idle" });
  const current = useRef<AbortController | null>(null);

  const cancel = useCallback(() => {
    current.current?.abort();
    current.current = null;
  }, []);

  const start = useCallback((request: JobRequest) => {
    current.current?.abort();
    const controller = new AbortController();
    current.current = controller;
    setState({ status: "running", progress: 0, phase: "starting" });
    runStrategyJob(request, {
      signal: controller.signal,
      onProgress: (progress, phase) => {
        if (current.current === controller) setState({ status: "running", progress, phase });
      },
    }).then(
      (outcome) => {
        if (current.current !== controller) return;
        current.current = null;
        setState(outcome.ok ? { status: "done", result: outcome.value } : { status: "invalid", errors: outcome.errors });
      },
      (error: unknown) => {
        const aborted = error instanceof DOMException && error.name === "AbortError";
        if (aborted) setState((s) => (s.status === "running" ? { status: "cancelled" } : s));
        else if (current.current === controller) setState({ status: "failed", message: error instanceof Error ? error.message : String(error) });
        if (current.current === controller) current.current = null;
      },
    );
  }, []);

  useEffect(() => () => current.current?.abort(), []);
  return { state, start, cancel };
}
