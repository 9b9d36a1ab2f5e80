import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError, isTransientError } from './api-client';

/**
 * Puts a failed request's field problems (`details[].path`) on the matching form fields
 * and returns what is left to say above the form, or null when every problem found its
 * field. A nested path ("priceBreaks.0.unitPrice") lands on its field if the form has
 * one of that name, else on its top-level field.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (isTransientError(error)) {
    return error.status === 0
      ? 'Farthing could not reach the server. Check the connection and try again.'
      : 'Farthing is reconnecting to its database. Try again in a moment.';
  }

  const known = new Set<string>(fields);
  const leftOver: string[] = [];
  let focused = false;
  for (const detail of error.details) {
    const top = detail.path.split('.')[0] ?? '';
    const field = known.has(detail.path) ? detail.path : known.has(top) ? top : null;
    if (field) {
      setError(field as Path<T>, { type: 'server', message: detail.message }, { shouldFocus: !focused });
      focused = true;
    } else {
      leftOver.push(detail.path ? `${detail.path} ${detail.message}` : detail.message);
    }
  }
  if (error.details.length === 0) return error.message;
  if (leftOver.length === 0) return null;
  return `${error.message} ${leftOver.join('; ')}`.trim();
}

/**
 * Our schemas word field messages as the end of a sentence ("is required"), so they
 * read after the field's label; a message that is already a sentence is kept.
 */
export function fieldMessage(label: string, message: string | undefined): string | undefined {
  if (!message) return undefined;
  return /^[a-z]/.test(message) ? `${label} ${message}` : message;
}
