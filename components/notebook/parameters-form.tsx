"use client";
// A Parameters block: named values that formulas in other blocks refer to. Each row is a name
// and a CodeMirror editor; the evaluated value shows beside it.
import { useId, useState } from "react";
import { removeParam, setParam, validParameterName, type BlockMap, type CompileMessage } from "@/lib/notebook";
import { Button } from "@/components/ui/button";
import { FieldMessages } from "./field-messages";
import { useEvaluationState, useNotebook } from "./notebook-context";
import { TextEditor } from "./text-editor";
import { useParamNames, useParamText } from "./use-param-text";

export function ParametersForm({ blockId, map, messages }: { blockId: string; map: BlockMap; messages: CompileMessage[] }) {
  const { canEdit } = useNotebook();
  const names = useParamNames(map);
  return (
    <div className="space-y-2">
      {names.length === 0 ? <p className="text-sm text-muted">No parameters yet.</p> : null}
      {names.map((name) => (
        <ParameterRow key={name} blockId={blockId} map={map} name={name} messages={messages.filter((m) => m.field === name)} />
      ))}
      {canEdit ? <AddParameter blockId={blockId} existing={names} /> : null}
    </div>
  );
}

function ParameterRow({ blockId, map, name, messages }: { blockId: string; map: BlockMap; name: string; messages: CompileMessage[] }) {
  const { awareness, undoManager, canEdit, focusBlock, doc, step } = useNotebook();
  const evaluation = useEvaluationState();
  const text = useParamText(map, name);
  const id = useId();
  const value = evaluation.parameters[name];
  const invalid = messages.some((m) => m.severity === "error");
  return (
    <div className="grid items-start gap-x-3 gap-y-1 sm:grid-cols-[11rem_1fr_auto]" data-field={name}>
      <code className="pt-1.5 font-mono text-sm font-semibold text-ink">{name}</code>
      <div className="min-w-0">
        {text ? (
          <TextEditor text={text} awareness={awareness} undoManager={undoManager} readOnly={!canEdit} label={`Parameter ${name}`}
            invalid={invalid} describedBy={invalid ? `${id}-m` : undefined} onFocus={() => focusBlock(blockId)} />
        ) : null}
        {value ? <p className="mt-0.5 font-mono text-xs text-muted">= {value}</p> : null}
        <FieldMessages id={`${id}-m`} messages={messages} text={text?.toString() ?? ""} />
      </div>
      {canEdit ? (
        <button type="button" onClick={() => step(() => removeParam(doc, blockId, name))} className="rounded-control px-2 py-1.5 text-sm text-danger hover:bg-danger-soft">
          Remove<span className="sr-only"> parameter {name}</span>
        </button>
      ) : <span />}
    </div>
  );
}

function AddParameter({ blockId, existing }: { blockId: string; existing: string[] }) {
  const { doc, focusBlock, step } = useNotebook();
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  const add = () => {
    const trimmed = name.trim();
    const check = validParameterName(trimmed);
    if (check) return setError(check);
    if (existing.includes(trimmed)) return setError(`"${trimmed}" is already defined in this block`);
    step(() => setParam(doc, blockId, trimmed, ""));
    setName("");
    setError(null);
  };
  return (
    <form className="flex flex-wrap items-start gap-2 pt-2" onSubmit={(e) => { e.preventDefault(); add(); }}>
      <div className="flex flex-col">
        <label htmlFor={id} className="sr-only">New parameter name</label>
        <input id={id} value={name} onChange={(e) => setName(e.target.value)} onFocus={() => focusBlock(blockId)} placeholder="new_name"
          aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-e` : undefined}
          className="w-44 rounded-control border border-rule-strong bg-paper-raised px-3 py-1.5 font-mono text-sm" />
        {error ? <p id={`${id}-e`} role="alert" className="mt-1 text-sm text-danger">{error}</p> : null}
      </div>
      <Button type="submit" variant="secondary" className="py-1.5">Add parameter</Button>
    </form>
  );
}
