import type { Harness } from './harness';

/** One request of a hostile batch, described as data so a batch can be built, sent and judged in bulk. */
export interface Attempt {
  label: string;
  method: string;
  url: string;
  headers: Record<string, string>;
  /** Raw body text, sent as is (so that malformed JSON and 1e999 survive). */
  raw?: string;
  contentType?: string;
  form?: { fields: [string, string][]; files?: { part: string; bytes: Buffer; name: string; type?: string }[] };
  /** The body field the attempt spoils, to check that a refusal names it. */
  field?: string;
  /** 'reject': must be a 4xx; 'tolerate': anything but a 5xx (valid-but-absurd values may be stored). */
  expect: 'reject' | 'tolerate';
  status?: number;
  code?: string;
}

export interface Answer {
  attempt: Attempt;
  status: number;
  contentType: string;
  body: unknown;
  ms: number;
  failure?: string;
}

const PER_REQUEST_MS = 15_000;

export async function send(h: Harness, a: Attempt): Promise<Answer> {
  let req = h.http()[a.method.toLowerCase() as 'get'](a.url).timeout(PER_REQUEST_MS);
  for (const [k, v] of Object.entries(a.headers)) req = req.set(k, v);
  if (a.raw !== undefined) req = req.set('Content-Type', a.contentType ?? 'application/json').send(a.raw);
  if (a.form) {
    for (const [k, v] of a.form.fields) req = req.field(k, v);
    for (const f of a.form.files ?? []) req = req.attach(f.part, f.bytes, { filename: f.name, contentType: f.type ?? 'application/octet-stream' });
  }
  const started = performance.now();
  try {
    const res = await req;
    return { attempt: a, status: res.status, contentType: String(res.headers['content-type'] ?? ''), body: res.body, ms: performance.now() - started };
  } catch (err) {
    const e = err as { timeout?: number; code?: string; message?: string };
    return {
      attempt: a,
      status: 0,
      contentType: '',
      body: null,
      ms: performance.now() - started,
      failure: e.timeout ? `no answer within ${PER_REQUEST_MS} ms` : `${e.code ?? ''} ${e.message ?? String(err)}`,
    };
  }
}

/** Sends a batch a few at a time: enough to be quick, few enough not to starve the database pool. */
export async function sendAll(h: Harness, attempts: Attempt[], parallel = 6): Promise<Answer[]> {
  const answers: Answer[] = new Array(attempts.length);
  let next = 0;
  await Promise.all(
    Array.from({ length: parallel }, async () => {
      while (next < attempts.length) {
        const i = next++;
        answers[i] = await send(h, attempts[i]!);
      }
    }),
  );
  return answers;
}

/** What is wrong with an answer, or undefined when it is what the attempt asked for. */
export function judge(ans: Answer): string | undefined {
  const a = ans.attempt;
  const where = `${a.method.toUpperCase()} ${a.url.slice(0, 120)} [${a.label}]`;
  if (ans.failure) return `${where}: ${ans.failure}`;
  if (ans.status >= 500) return `${where} → ${ans.status} ${JSON.stringify(ans.body).slice(0, 200)}`;
  if (a.expect === 'reject' && (ans.status < 400 || ans.status >= 500)) return `${where} → ${ans.status}, want a 4xx`;
  if (a.status !== undefined && ans.status !== a.status) return `${where} → ${ans.status}, want ${a.status}`;
  if (ans.status < 400) return undefined;
  if (!ans.contentType.startsWith('application/json')) return `${where} → ${ans.status} as ${ans.contentType}, want JSON`;
  const err = (ans.body as { error?: { code?: unknown; message?: unknown; fields?: Record<string, string> } } | null)?.error;
  if (typeof err?.code !== 'string' || !/^[a-z][a-z0-9_]*$/.test(err.code))
    return `${where} → ${ans.status} without an error code: ${JSON.stringify(ans.body).slice(0, 200)}`;
  if (a.code !== undefined && err.code !== a.code) return `${where} → code ${err.code}, want ${a.code}`;
  // A sentence a person can act on: several words, not a bare code or an empty string.
  if (typeof err.message !== 'string' || err.message.trim().split(/\s+/).length < 4)
    return `${where} → message ${JSON.stringify(err.message)} is not a sentence`;
  if (a.expect === 'reject' && a.field && err.code === 'invalid_input' && err.fields) {
    const keys = Object.keys(err.fields);
    const f = a.field;
    if (!keys.some((k) => k === f || f.startsWith(`${k}.`) || k.startsWith(`${f}.`))) return `${where} → fields ${keys.join(', ')} do not name ${f}`;
  }
  return undefined;
}
