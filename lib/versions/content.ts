// What a saved version stores besides the Yjs state: the compiled Scenario and the Result
// summary, computed here from the document itself (never taken from a client).
import * as Y from "yjs";
import { evaluateScenario, parseScenario } from "@/lib/engine";
import { compile, readDoc, type CompileMessage, type DocSnapshot, type LibraryResolver } from "@/lib/notebook";
import { summarizeResult } from "./summary";
import type { ResultSummary } from "./types";

export interface VersionContent {
  snapshot: DocSnapshot;
  /** null when the document does not compile (a version of a draft is still a version) */
  scenario: Record<string, unknown> | null;
  summary: ResultSummary | null;
  /** why there is no scenario or no summary, for the version list */
  problems: string[];
}

export function docFromState(state: Uint8Array): Y.Doc {
  const doc = new Y.Doc();
  if (state.byteLength > 0) Y.applyUpdate(doc, state);
  return doc;
}

export function snapshotOfState(state: Uint8Array): DocSnapshot {
  const doc = docFromState(state);
  try {
    return readDoc(doc);
  } finally {
    doc.destroy();
  }
}

const errorTexts = (messages: CompileMessage[]) => messages.filter((m) => m.severity === "error").map((m) => m.text);

/** `resolveLibrary`: drive cycles from the team library (lib/library/resolver.ts), loaded by the caller. */
export function versionContent(snapshot: DocSnapshot, resolveLibrary?: LibraryResolver): VersionContent {
  const compiled = compile({ ...snapshot, resolveLibrary });
  if (!compiled.scenario) return { snapshot, scenario: null, summary: null, problems: errorTexts(compiled.messages) };
  const parsed = parseScenario(compiled.scenario);
  if (!parsed.ok) return { snapshot, scenario: compiled.scenario, summary: null, problems: parsed.errors.map((e) => e.message) };
  const evaluated = evaluateScenario(parsed.scenario);
  if (!evaluated.ok) return { snapshot, scenario: compiled.scenario, summary: null, problems: evaluated.errors.map((e) => e.message) };
  return { snapshot, scenario: compiled.scenario, summary: summarizeResult(evaluated.result), problems: [] };
}
