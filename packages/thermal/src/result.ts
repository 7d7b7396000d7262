/**
 * Errors are values, never exceptions: a forecast that cannot run says why in a sentence, so a
 * half-typed form in the browser never crashes the live numbers (the same contract as core's).
 */
export interface ThermalIssue {
  /** The input field the issue is about. */
  field: string;
  message: string;
}

export interface ThermalError {
  /** Stable, snake_case, for programs (the API maps codes to status codes). */
  code: string;
  /** One or more sentences for people: what was wrong and how to fix it. */
  message: string;
  issues?: ThermalIssue[];
}

export type Result<T> = { ok: true; value: T } | { ok: false; error: ThermalError };

export function ok<T>(value: T): Result<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: string, message: string, issues?: ThermalIssue[]): Result<T> {
  return issues ? { ok: false, error: { code, message, issues } } : { ok: false, error: { code, message } };
}
