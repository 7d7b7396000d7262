/**
 * Errors in core are values, never exceptions: every function that can refuse its input returns a
 * `Result<T>`. Callers (browser, API, CLI) decide how to show the sentence; nothing here throws for
 * bad input, so a half-typed form never crashes the live numbers.
 */
export interface CoreIssue {
    /** 1-based row of an imported file, when the issue belongs to one. */
    row?: number;
    /** The input field the issue is about, when there is one. */
    field?: string;
    message: string;
}
export interface CoreError {
    /** Stable, snake_case, for programs (the API maps codes to status codes). */
    code: string;
    /** One or more sentences for people: what was wrong and how to fix it. */
    message: string;
    /** Every individual problem, when there were several (e.g. all bad rows of a CSV). */
    issues?: CoreIssue[];
}
export type Result<T> = {
    ok: true;
    value: T;
} | {
    ok: false;
    error: CoreError;
};
export declare function ok<T>(value: T): Result<T>;
export declare function fail<T = never>(code: string, message: string, issues?: CoreIssue[]): Result<T>;
/** A check for a number that must be finite and above zero, phrased for the person who typed it. */
export declare function requirePositive(value: number, label: string, code?: string): Result<number>;
export declare function requireNonNegative(value: number, label: string, code?: string): Result<number>;
