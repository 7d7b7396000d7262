import { isApiError } from './api-error';
import { errorNotice } from './error-notice';

export interface SplitFieldErrors<F extends string> {
  byField: Partial<Record<F, string>>;
  /** Messages about fields this form does not show; they belong in the form-level alert. */
  other: string[];
}

export function splitFieldErrors<F extends string>(fields: Readonly<Record<string, string>>, formFields: readonly F[]): SplitFieldErrors<F> {
  const known = new Set<string>(formFields);
  const byField: Partial<Record<F, string>> = {};
  const other: string[] = [];
  for (const [name, message] of Object.entries(fields)) {
    if (known.has(name)) byField[name as F] = message;
    else other.push(message);
  }
  return { byField, other };
}

export type SetFieldError<F extends string> = (name: F, error: { type: string; message: string }, options?: { shouldFocus: boolean }) => void;

/**
 * Puts the server's field messages under their fields and returns what is left for the form-level alert,
 * or null when every message found a field.
 */
export function applyServerErrors<F extends string>(error: unknown, setError: SetFieldError<F>, formFields: readonly F[]): string | null {
  if (!isApiError(error)) return errorNotice(error).message;
  const { byField, other } = splitFieldErrors(error.fields, formFields);
  let first = true;
  for (const name of formFields) {
    const message = byField[name];
    if (message === undefined) continue;
    setError(name, { type: 'server', message }, { shouldFocus: first });
    first = false;
  }
  if (other.length > 0) return [error.message, ...other].join(' ');
  return first ? error.message : null;
}
