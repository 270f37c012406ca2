"use client";
// The user's confirmation of how the file is read: delimiter, decimal mark, header rows, which
// column is what and in which unit. Starts from the server's proposal; every change re-previews.
import type { ChangeEvent } from "react";
import type { LibraryKind } from "@/lib/library/kinds";

type Conf = Record<string, unknown> & { delimiter: string; decimal: string; header_rows: number };
type Col = { column: number; unit?: string } | null;

const DELIMITERS = [[",", "comma"], [";", "semicolon"], ["\t", "tab"], ["|", "bar"]];
const select = "select w-full py-1.5 pl-2 text-sm border-rule-strong";

function Field({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <label className="flex flex-col gap-1 text-sm">
      <span className="font-medium">{label}</span>
      {children}
    </label>
  );
}

function ColumnSelect({ value, headers, optional, onChange }: { value: Col; headers: string[]; optional?: boolean; onChange: (c: number | null) => void }) {
  return (
    <select className={select} value={value ? String(value.column) : ""} onChange={(e) => onChange(e.target.value === "" ? null : Number(e.target.value))}>
      {optional || !value ? <option value="">{optional ? "none" : "choose…"}</option> : null}
      {headers.map((h, i) => <option key={i} value={i + 1}>{`${i + 1} — ${h}`}</option>)}
    </select>
  );
}

function UnitSelect({ value, units, onChange }: { value: string | undefined; units: string[]; onChange: (u: string) => void }) {
  return (
    <select className={select} value={value ?? units[0]} onChange={(e) => onChange(e.target.value)}>
      {units.map((u) => <option key={u} value={u}>{u}</option>)}
    </select>
  );
}

const ROLES: Record<LibraryKind, { key: string; label: string; units?: string[]; optional?: boolean }[]> = {
  cycle: [
    { key: "time", label: "Time column", units: ["s", "ms", "min", "h"], optional: true },
    { key: "speed", label: "Speed column", units: ["km/h", "m/s", "mph"] },
    { key: "grade", label: "Grade column (%)", optional: true },
  ],
  engine_full_load: [
    { key: "speed", label: "Engine speed column", units: ["rpm", "rad/s"] },
    { key: "torque", label: "Full-load torque column (N·m)" },
  ],
  battery_ocv: [
    { key: "soc", label: "SOC column", units: ["fraction", "%"] },
    { key: "voltage", label: "Open-circuit voltage column (V)" },
  ],
};

export function ConfirmForm({ kind, headers, value, onChange }: { kind: LibraryKind; headers: string[]; value: Conf; onChange: (next: Conf) => void }) {
  const set = (patch: Record<string, unknown>) => onChange({ ...value, ...patch });
  const num = (e: ChangeEvent<HTMLInputElement>) => (e.target.value.trim() === "" ? null : Number(e.target.value));
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <Field label="Delimiter">
        <select className={select} value={value.delimiter} onChange={(e) => set({ delimiter: e.target.value })}>
          {DELIMITERS.map(([d, l]) => <option key={l} value={d}>{l}</option>)}
        </select>
      </Field>
      <Field label="Decimal mark">
        <select className={select} value={value.decimal} onChange={(e) => set({ decimal: e.target.value })}>
          <option value=".">point (1.5)</option>
          <option value=",">comma (1,5)</option>
        </select>
      </Field>
      <Field label="Header rows">
        <select className={select} value={String(value.header_rows)} onChange={(e) => set({ header_rows: Number(e.target.value) })}>
          <option value="0">none</option>
          <option value="1">names</option>
          <option value="2">names and units</option>
        </select>
      </Field>
      {ROLES[kind].map((role) => {
        const col = (value[role.key] as Col) ?? null;
        return (
          <div key={role.key} className="grid grid-cols-[1fr_auto] items-end gap-2">
            <Field label={role.label}>
              <ColumnSelect value={col} headers={headers} optional={role.optional}
                onChange={(c) => set({ [role.key]: c === null ? null : { column: c, ...(role.units ? { unit: col?.unit ?? role.units[0] } : {}) } })} />
            </Field>
            {role.units && col ? <UnitSelect value={col.unit} units={role.units} onChange={(u) => set({ [role.key]: { ...col, unit: u } })} /> : <span />}
          </div>
        );
      })}
      {kind === "cycle" ? (
        <>
          {value.time === null ? (
            <Field label="Rows are apart by (s)">
              <input className="rounded-control border border-rule-strong px-2 py-1.5 text-sm" type="number" min="0" step="any" value={String(value.sample_dt_s ?? 1)} onChange={(e) => set({ sample_dt_s: num(e) })} />
            </Field>
          ) : null}
          <Field label="Resample every (s; blank = median spacing)">
            <input className="rounded-control border border-rule-strong px-2 py-1.5 text-sm" type="number" min="0" step="any" value={value.dt_s === null || value.dt_s === undefined ? "" : String(value.dt_s)} onChange={(e) => set({ dt_s: num(e) })} />
          </Field>
        </>
      ) : null}
    </div>
  );
}

export type { Conf };
