"use client";
import { sentence } from "./sentence";
import { useId, type ComponentProps } from "react";

type Props = ComponentProps<"input"> & { label: string; error?: string; hint?: string };

// A labelled input whose error is tied to it (aria-describedby) and announced when it appears.
export function TextField({ label, error, hint, className = "", id, ...input }: Props) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const errorId = `${inputId}-error`;
  const hintId = `${inputId}-hint`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ");
  return (
    <div className={`flex flex-col gap-1.5 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        className={
          "rounded-control border bg-paper-raised px-3 py-2 text-ink placeholder:text-muted " +
          (error ? "border-danger" : "border-rule-strong")
        }
        {...input}
      />
      {hint && !error ? (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      <p id={errorId} role="alert" className="min-h-0 text-sm text-danger empty:hidden">
        {error ? sentence(error) : ""}
      </p>
    </div>
  );
}
