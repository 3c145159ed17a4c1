import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError, messageOf } from "@/components/api/client";

/**
 * Puts the server's field messages under the matching fields of a form, and returns the message to show above
 * the form, if any: the server's own words whenever the failure is more than a field being badly filled in.
 */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly Path<T>[]): string | null {
  if (!(error instanceof ApiError)) return messageOf(error);
  let placed = 0;
  for (const issue of error.fields) {
    const field = fields.find((f) => f === issue.path);
    if (field) {
      setError(field, { type: "server", message: issue.message }, { shouldFocus: placed === 0 });
      placed += 1;
    }
  }
  const onlyFieldProblems = error.code === "validation_failed" && placed > 0;
  return onlyFieldProblems ? null : error.message;
}
