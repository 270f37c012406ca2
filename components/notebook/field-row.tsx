"use client";
// One parameter of a block: label, CodeMirror editor bound to its Y.Text (or a select for a
// choice), the compiled value in the Scenario's unit, and compile messages under it.
import { memo, useId } from "react";
import { fieldLabel, setParam, type BlockKind, type BlockMap, type ChoiceField, type CompileMessage, type FieldDef, type TextField } from "@/lib/notebook";
import type { LibraryKind } from "@/lib/library/kinds";
import { fmtValue } from "@/lib/client/notebook/format";
import { FieldMessages } from "./field-messages";
import { LibraryPicker } from "./library-picker";
import { useNotebook } from "./notebook-context";
import { TextEditor } from "./text-editor";
import { paramsOf, useParamText } from "./use-param-text";

export const FieldRow = memo(function FieldRow({ blockId, kind, map, field, messages, value }: { blockId: string; kind: BlockKind; map: BlockMap; field: FieldDef; messages: CompileMessage[]; value: unknown }) {
  const id = useId();
  const label = fieldLabel(kind, field.key);
  const prefix = `${label}: `;
  const own = messages.map((m) => (m.text.startsWith(prefix) ? { ...m, text: m.text.slice(prefix.length) } : m));
  return (
    <div className={`min-w-0 ${field.type === "list" ? "lg:col-span-2" : ""}`} data-field={field.key}>
      <div className="mb-1 flex flex-wrap items-baseline gap-x-2">
        <label htmlFor={field.type === "choice" || isLibraryRef(field) ? id : undefined} id={`${id}-label`} className="text-sm font-medium text-ink">
          {field.label}
        </label>
        {field.optional ? <span className="text-xs text-muted">optional</span> : null}
      </div>
      {field.type === "choice" ? (
        <ChoiceInput id={id} blockId={blockId} map={map} field={field} label={label} invalid={own.length > 0} />
      ) : isLibraryRef(field) ? (
        <LibraryPicker id={id} blockId={blockId} map={map} field={field} label={label} invalid={own.some((m) => m.severity === "error")} describedBy={own.length > 0 ? `${id}-messages` : undefined} />
      ) : (
        <TextInput map={map} field={field} label={label} invalid={own.some((m) => m.severity === "error")} messagesId={`${id}-messages`} blockId={blockId} />
      )}
      <div className="mt-0.5 flex flex-wrap justify-between gap-x-3 text-xs">
        <CompiledValue field={field} value={value} />
        {field.help ? <p className="ml-auto text-right text-muted">{field.help}</p> : null}
      </div>
      <FieldMessages id={`${id}-messages`} messages={own} text={paramsOf(map)?.get(field.key)?.toString() ?? ""} />
    </div>
  );
});

function isLibraryRef(field: FieldDef): field is TextField & { library: LibraryKind } {
  return field.type === "text" && field.library !== undefined;
}

function TextInput({ map, field, label, invalid, messagesId, blockId }: { map: BlockMap; field: FieldDef; label: string; invalid: boolean; messagesId: string; blockId: string }) {
  const { awareness, undoManager, canEdit, focusBlock, doc } = useNotebook();
  const text = useParamText(map, field.key);
  if (!text) {
    // A key the document does not have yet: editors create it on first focus.
    return (
      <button
        type="button"
        disabled={!canEdit}
        aria-label={label}
        onFocus={() => { if (canEdit) { setParam(doc, blockId, field.key, ""); focusBlock(blockId); } }}
        className="block w-full rounded-control border border-dashed border-rule-strong px-3 py-1.5 text-left text-sm text-muted"
      >
        {canEdit ? "empty — click to enter a value" : "empty"}
      </button>
    );
  }
  return (
    <TextEditor
      text={text}
      awareness={awareness}
      undoManager={undoManager}
      readOnly={!canEdit}
      label={label}
      multiline={field.type === "list" && field.key === "speeds"}
      placeholder={field.optional ? "empty: engine default" : undefined}
      invalid={invalid}
      describedBy={invalid ? messagesId : undefined}
      onFocus={() => focusBlock(blockId)}
    />
  );
}

function ChoiceInput({ id, blockId, map, field, label, invalid }: { id: string; blockId: string; map: BlockMap; field: ChoiceField; label: string; invalid: boolean }) {
  const { doc, canEdit, focusBlock, step } = useNotebook();
  const text = useParamText(map, field.key);
  const current = (text?.toString() ?? field.default).trim();
  const known = field.options.some((o) => o.value === current);
  return (
    <select
      id={id}
      aria-label={label}
      value={current}
      disabled={!canEdit}
      aria-invalid={invalid || undefined}
      onFocus={() => focusBlock(blockId)}
      onChange={(event) => { const v = event.target.value; step(() => setParam(doc, blockId, field.key, v)); }}
      className={"w-full rounded-control border bg-paper-raised px-3 py-1.5 text-sm text-ink disabled:bg-paper-sunk/50 " + (invalid ? "border-danger" : "border-rule-strong")}
    >
      {known ? null : <option value={current}>{current || "(none)"}</option>}
      {field.options.map((o) => (
        <option key={o.value} value={o.value}>{o.label}</option>
      ))}
    </select>
  );
}

function CompiledValue({ field, value }: { field: FieldDef; value: unknown }) {
  if (field.type === "choice" || field.type === "text" || value === undefined || value === null) return null;
  const unit = field.unit ? ` ${field.unit}` : "";
  let shown: string | null = null;
  if (typeof value === "number" && Number.isFinite(value)) shown = `= ${fmtValue(value)}${unit}`;
  else if (Array.isArray(value)) shown = `${value.length} value${value.length === 1 ? "" : "s"}${unit ? ` in${unit}` : ""}`;
  if (!shown) return null;
  return <p className="font-mono text-muted" data-compiled-value>{shown}</p>;
}

