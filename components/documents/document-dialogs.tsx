"use client";
// Dialogs of the documents table: a new document from a powertrain template, and rename.
import { useEffect, useId, useRef, useState, type FormEvent, type ReactNode } from "react";
import { POWERTRAIN_LABELS, POWERTRAINS, type PowertrainKind } from "@/lib/notebook";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { SelectField } from "@/components/ui/select-field";
import { FormMessage } from "@/components/ui/form-message";

function Dialog({ open, title, onClose, children }: { open: boolean; title: string; onClose: () => void; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog ref={ref} aria-labelledby={titleId} onClose={onClose}
      className="m-auto w-full max-w-md rounded-card border border-rule bg-paper-raised p-gutter text-ink shadow-card backdrop:bg-ink/30">
      <h2 id={titleId} className="text-lg font-semibold">{title}</h2>
      {open ? children : null}
    </dialog>
  );
}

const POWERTRAIN_OPTIONS = POWERTRAINS.map((p) => ({ value: p, label: POWERTRAIN_LABELS[p].charAt(0).toUpperCase() + POWERTRAIN_LABELS[p].slice(1) }));

export function CreateDocumentDialog(props: {
  open: boolean; pending: boolean; error?: string; fieldErrors?: Record<string, string>;
  onCancel: () => void; onCreate: (input: { name: string; powertrain: PowertrainKind }) => void;
}) {
  const [name, setName] = useState("");
  const [powertrain, setPowertrain] = useState<PowertrainKind>("parallel");
  const [nameError, setNameError] = useState<string>();
  useEffect(() => { if (props.open) { setName(""); setNameError(undefined); } }, [props.open]);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!name.trim()) return setNameError("enter a document name");
    props.onCreate({ name: name.trim(), powertrain });
  };
  return (
    <Dialog open={props.open} title="New scenario document" onClose={props.onCancel}>
      <form onSubmit={submit} className="mt-4 space-y-4" noValidate>
        <p className="text-sm text-ink-soft">It starts from the template of the powertrain: a midsize car on the NEDC that you then make your own.</p>
        <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} autoFocus
          error={nameError ?? props.fieldErrors?.name} />
        <SelectField label="Powertrain" value={powertrain} options={POWERTRAIN_OPTIONS}
          onChange={(e) => setPowertrain(e.target.value as PowertrainKind)} error={props.fieldErrors?.powertrain} />
        <FormMessage error={props.error} />
        <div className="flex justify-end gap-3">
          <Button variant="secondary" onClick={props.onCancel}>Cancel</Button>
          <Button type="submit" disabled={props.pending}>{props.pending ? "Creating…" : "Create document"}</Button>
        </div>
      </form>
    </Dialog>
  );
}

export function RenameDocumentDialog(props: {
  open: boolean; current: string; pending: boolean; error?: string;
  onCancel: () => void; onRename: (name: string) => void;
}) {
  const [name, setName] = useState(props.current);
  const [nameError, setNameError] = useState<string>();
  useEffect(() => { if (props.open) { setName(props.current); setNameError(undefined); } }, [props.open, props.current]);
  return (
    <Dialog open={props.open} title="Rename document" onClose={props.onCancel}>
      <form className="mt-4 space-y-4" noValidate onSubmit={(e) => { e.preventDefault(); if (!name.trim()) return setNameError("enter a document name"); props.onRename(name.trim()); }}>
        <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} autoFocus error={nameError} />
        <FormMessage error={props.error} />
        <div className="flex justify-end gap-3">
          <Button variant="secondary" onClick={props.onCancel}>Cancel</Button>
          <Button type="submit" disabled={props.pending}>{props.pending ? "Saving…" : "Rename"}</Button>
        </div>
      </form>
    </Dialog>
  );
}
