import type { LibraryKind } from "@/lib/library/kinds";
import type { Quantity } from "./dimensions";

/** One parameter of a block: how it is edited, read and where it goes in the Scenario. */
interface FieldBase {
  key: string;
  label: string;
  help: string;
  /** text a new block starts with ("" = left empty) */
  default: string;
  /** empty text is allowed: the Scenario then omits the value (engine default) */
  optional?: boolean;
  /** shown and compiled only when another (choice) field of the block has one of these values */
  when?: { field: string; in: readonly string[] };
  /** hidden and not compiled while this other field of the block has text (a library reference replacing it) */
  unlessSet?: string;
}

export interface NumberField extends FieldBase {
  type: "number";
  quantity: Quantity;
  /** unit of the Scenario value, and of a bare number */
  unit: string;
  path: readonly string[];
  integer?: boolean;
}

export interface ListField extends FieldBase {
  type: "list";
  quantity: Quantity;
  unit: string;
  path: readonly string[];
}

export interface ChoiceField extends FieldBase {
  type: "choice";
  options: readonly { value: string; label: string }[];
  path?: readonly string[];
}

export interface TextField extends FieldBase {
  type: "text";
  /** the text is the id of a workspace library item of this kind (the notebook shows a picker) */
  library?: LibraryKind;
}

export type FieldDef = NumberField | ListField | ChoiceField | TextField;

type Extra = Partial<Pick<FieldBase, "optional" | "when" | "unlessSet">> & { integer?: boolean };

export function num(key: string, label: string, quantity: Quantity, unit: string, path: string, def: string, help: string, extra: Extra = {}): NumberField {
  return { type: "number", key, label, quantity, unit, path: path.split("."), default: def, help, ...extra };
}

export function list(key: string, label: string, quantity: Quantity, unit: string, path: string, def: string, help: string, extra: Extra = {}): ListField {
  return { type: "list", key, label, quantity, unit, path: path.split("."), default: def, help, ...extra };
}

export function choice(
  key: string, label: string, options: [string, string][], def: string, help: string, path?: string, extra: Extra = {},
): ChoiceField {
  return {
    type: "choice", key, label, options: options.map(([value, l]) => ({ value, label: l })), default: def, help,
    path: path?.split("."), ...extra,
  };
}

/** A reference to a workspace library item, stored as its id (compiled by compile-library.ts). */
export function libraryRef(key: string, label: string, help: string, extra: Extra & { kind: LibraryKind }): TextField {
  const { kind, ...rest } = extra;
  return { type: "text", key, label, default: "", help, library: kind, ...rest };
}
