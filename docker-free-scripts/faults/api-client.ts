import { DEMO_PASSWORD } from '@gelpoint/db';

export interface Answer {
  status: number;
  body: unknown;
  ms: number;
}

export interface ApiError {
  error: { code: string; message: string };
}

export function isApiError(body: unknown): body is ApiError {
  const e = (body as ApiError | undefined)?.error;
  return typeof e?.code === 'string' && typeof e.message === 'string';
}

/** One request to the API, timed; a request that takes longer than `timeoutMs` is aborted and fails. */
export async function call(
  baseUrl: string,
  method: string,
  path: string,
  opts: { token?: string; json?: unknown; body?: RequestInit['body']; contentType?: string; timeoutMs?: number } = {},
): Promise<Answer> {
  const headers: Record<string, string> = {};
  if (opts.token) headers.Authorization = `Bearer ${opts.token}`;
  if (opts.json !== undefined) headers['Content-Type'] = 'application/json';
  if (opts.contentType) headers['Content-Type'] = opts.contentType;
  const started = performance.now();
  const r = await fetch(`${baseUrl}${path}`, {
    method,
    headers,
    body: opts.json !== undefined ? JSON.stringify(opts.json) : opts.body,
    signal: AbortSignal.timeout(opts.timeoutMs ?? 30_000),
  });
  const text = await r.text();
  let body: unknown = text;
  try {
    body = JSON.parse(text);
  } catch {
    // not JSON: kept as text, which a check that wants JSON reports
  }
  return { status: r.status, body, ms: performance.now() - started };
}

/** Signs a demo person in; returns the bearer token, or undefined when the API refused. */
export async function signIn(baseUrl: string, email: string): Promise<{ answer: Answer; token?: string }> {
  const answer = await call(baseUrl, 'POST', '/api/auth/login', { json: { email, password: DEMO_PASSWORD }, timeoutMs: 15_000 });
  const token = answer.status === 200 ? (answer.body as { token: string }).token : undefined;
  return { answer, token };
}

export function describe(a: Answer): string {
  return `${a.status} in ${a.ms.toFixed(0)} ms: ${JSON.stringify(a.body).slice(0, 200)}`;
}
