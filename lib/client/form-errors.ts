import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "./api";

// Puts a server refusal where the user will look: 422 field messages next to their fields,
// everything else (409, 429, 403, network) at the top of the form. Returns the top message.
export function applyServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | undefined {
  if (!(error instanceof ApiError)) return "Something went wrong. Try again.";
  let placed = 0;
  for (const [field, message] of Object.entries(error.fields)) {
    const name = fieldNames.find((candidate) => candidate === field);
    if (name) {
      setError(name, { type: "server", message });
      placed += 1;
    }
  }
  const unplaced = Object.keys(error.fields).length - placed;
  if (placed > 0 && unplaced === 0) return undefined;
  return error.message;
}
