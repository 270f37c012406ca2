// compile (lib/notebook) → evaluate (lib/engine), as one pure function so the worker stays a
// thin shell and tests can call it directly. Engine refusals are mapped back to the block and
// field that wrote the offending Scenario value, like compile's own messages.
import { compile, describeDimension, findUnit, fromSI, type CompileMessage, type DocSnapshot, type LibraryItemData, type ParameterResult, type SourceTable } from "@/lib/notebook";
import { pathKey } from "@/lib/notebook/compile-types";
import { evaluateScenarioInput, type Scenario, type ScenarioError } from "@/lib/engine";
import type { CompiledValues, EvaluateResponse, ParameterValues } from "./protocol";

function engineMessage(error: ScenarioError, sources: SourceTable): CompileMessage {
  let key = pathKey(error.path);
  // Walk up the path until a field claims it ("battery.ocv.soc" → "battery.ocv" → "battery").
  while (key && !sources.has(key)) key = key.includes(".") ? key.slice(0, key.lastIndexOf(".")) : "";
  const source = key ? sources.get(key) : undefined;
  return { blockId: source?.blockId, field: source?.field, severity: "error", text: error.message };
}

function plainValues(values: Map<string, Record<string, unknown>>): CompiledValues {
  const out: CompiledValues = {};
  for (const [blockId, fields] of values) out[blockId] = fields;
  return out;
}

function shownParameter(r: ParameterResult): string | null {
  if (!r.ok || !Number.isFinite(r.value_si)) return null;
  const unit = r.unit ? findUnit(r.unit) : undefined;
  const value = unit ? fromSI(r.value_si, unit) : r.value_si;
  const text = Number.isInteger(value) ? String(value) : value.toPrecision(6).replace(/\.?0+$/, "");
  return unit ? `${text} ${unit.symbol}` : `${text} (SI, ${describeDimension(r.dim)})`;
}

function parameterValues(results: Map<string, ParameterResult>): ParameterValues {
  const out: ParameterValues = {};
  for (const [name, r] of results) out[name] = shownParameter(r);
  return out;
}

export function runEvaluation(id: number, snapshot: DocSnapshot, library?: Record<string, LibraryItemData | string>): EvaluateResponse {
  const started = performance.now();
  const resolveLibrary = library ? (key: string) => library[key] ?? "loading from the library…" : undefined;
  const compiled = compile({ ...snapshot, resolveLibrary });
  const values = plainValues(compiled.values);
  const parameters = parameterValues(compiled.parameters);
  const elapsed = () => performance.now() - started;
  if (!compiled.scenario) return { id, ok: false, messages: compiled.messages, values, parameters, elapsed_ms: elapsed() };
  const outcome = evaluateScenarioInput(compiled.scenario);
  if (!outcome.ok) {
    const messages = [...compiled.messages, ...outcome.errors.map((e) => engineMessage(e, compiled.sources))];
    return { id, ok: false, messages, values, parameters, elapsed_ms: elapsed() };
  }
  return { id, ok: true, result: outcome.result, scenario: compiled.scenario as unknown as Scenario, messages: compiled.messages, values, parameters, elapsed_ms: elapsed() };
}
