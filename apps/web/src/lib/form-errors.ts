import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError, errorMessage } from "./api-client.ts";

type Options<T extends FieldValues> = {
  fields: readonly Path<T>[];
  /** Errors without details that still clearly belong to one field, e.g. email_taken → email. */
  codeFields?: Partial<Record<string, Path<T>>>;
  /** The form's name for a field the API names otherwise (hourlyRateCents → rate); others keep their name. */
  fromApiField?: (apiField: string) => string;
};

/**
 * Puts the API's per-field messages under the matching inputs. Returns the message to show
 * at the top of the form when nothing could be placed on a field, or null when all was placed.
 */
export function applyApiErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  { fields, codeFields = {}, fromApiField = (field) => field }: Options<T>,
): string | null {
  if (!(error instanceof ApiError)) return errorMessage(error);
  const known = new Set<string>(fields);
  // Field-array paths such as contacts.0.email belong to a known root like "contacts".
  const isKnown = (field: string) => known.has(field) || known.has(field.split(".")[0] ?? "");
  let placed = 0;
  for (const detail of error.details) {
    const field = fromApiField(detail.field);
    if (!isKnown(field)) continue;
    setError(field as Path<T>, { type: "server", message: detail.message });
    placed += 1;
  }
  const codeField = codeFields[error.code];
  if (placed === 0 && codeField) {
    setError(codeField, { type: "server", message: error.message });
    placed += 1;
  }
  return placed > 0 ? null : error.message;
}
