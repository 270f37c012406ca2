"use client";
import { sentence } from "./sentence";
import { useId, type ComponentProps } from "react";

type Props = ComponentProps<"select"> & {
  label: string;
  error?: string;
  options: readonly { value: string; label: string }[];
};

export function SelectField({ label, error, options, className = "", id, ...select }: Props) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const errorId = `${selectId}-error`;
  return (
    <div className={`flex flex-col gap-1.5 ${className}`}>
      <label htmlFor={selectId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <select
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        className={
          "select py-2 pl-3 " +
          (error ? "border-danger" : "border-rule-strong")
        }
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <p id={errorId} role="alert" className="text-sm text-danger empty:hidden">
        {error ? sentence(error) : ""}
      </p>
    </div>
  );
}
