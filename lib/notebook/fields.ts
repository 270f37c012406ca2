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
}

export type FieldDef = NumberField | ListField | ChoiceField | TextField;

type Extra = Partial<Pick<FieldBase, "optional" | "when">> & { integer?: boolean };

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
