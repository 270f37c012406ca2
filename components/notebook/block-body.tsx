"use client";
// The body of a block by kind: a form of its fields, its parameters, a note, or a result view.
import { FIELDS, fieldActive, type BlockKind, type BlockMap, type CompileMessage } from "@/lib/notebook";
import { FieldRow } from "./field-row";
import { ParametersForm } from "./parameters-form";
import { HeadlineFigures } from "./headline-figures";
import { LossLedger } from "./loss-ledger";
import { EnergyFlow, OperatingPoints, StrategyComparison, Traces } from "./chart-views";
import { useParamValues } from "./use-param-text";

export function BlockBody({ id, kind, map, messages, values }: { id: string; kind: BlockKind; map: BlockMap; messages: CompileMessage[]; values: Record<string, unknown> | undefined }) {
  switch (kind) {
    case "headline_figures": return <HeadlineFigures />;
    case "loss_ledger": return <LossLedger />;
    case "energy_flow": return <EnergyFlow />;
    case "traces": return <Traces />;
    case "operating_points": return <OperatingPoints />;
    case "strategy_comparison": return <StrategyComparison />;
    case "parameters": return <ParametersForm blockId={id} map={map} messages={messages} />;
    case "note": return null;
    default: return <FieldsForm id={id} kind={kind} map={map} messages={messages} values={values} />;
  }
}

const NO_MESSAGES: CompileMessage[] = [];

function FieldsForm({ id, kind, map, messages, values }: { id: string; kind: BlockKind; map: BlockMap; messages: CompileMessage[]; values: Record<string, unknown> | undefined }) {
  const fields = FIELDS[kind];
  // fields that decide which others show: choices (`when`) and library references (`unlessSet`)
  const drivers = Array.from(new Set(fields.flatMap((f) => [...(f.when ? [f.when.field] : []), ...(f.unlessSet ? [f.unlessSet] : [])])));
  const choices = useParamValues(map, drivers);
  return (
    <div className="grid gap-x-6 gap-y-3 lg:grid-cols-2">
      {fields.filter((f) => fieldActive(f, choices, kind)).map((f) => (
        <FieldRow key={f.key} blockId={id} kind={kind} map={map} field={f} value={values?.[f.key]}
          messages={messages.length === 0 ? NO_MESSAGES : messages.filter((m) => m.field === f.key)} />
      ))}
    </div>
  );
}
