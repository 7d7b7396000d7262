export interface Answer<T> {
  status: number;
  body: T;
}

export interface CallOptions {
  token?: string;
  json?: unknown;
  form?: FormData;
  csv?: string;
}

/** One HTTP call to an API instance; the body is parsed when it is JSON. */
export async function call<T = Record<string, unknown>>(base: string, method: string, path: string, opts: CallOptions = {}): Promise<Answer<T>> {
  const headers: Record<string, string> = {};
  if (opts.token) headers.authorization = `Bearer ${opts.token}`;
  let body: string | FormData | undefined;
  if (opts.json !== undefined) {
    headers['content-type'] = 'application/json';
    body = JSON.stringify(opts.json);
  } else if (opts.csv !== undefined) {
    headers['content-type'] = 'text/csv';
    body = opts.csv;
  } else if (opts.form) {
    body = opts.form;
  }
  const res = await fetch(`${base}/api${path}`, { method, headers, body });
  const text = await res.text();
  let parsed: unknown = text;
  if ((res.headers.get('content-type') ?? '').includes('json') && text) parsed = JSON.parse(text);
  return { status: res.status, body: parsed as T };
}

/** The same call, when anything but `status` means the bench cannot go on. */
export async function must<T = Record<string, unknown>>(status: number, base: string, method: string, path: string, opts: CallOptions = {}): Promise<T> {
  const a = await call<T>(base, method, path, opts);
  if (a.status !== status) throw new Error(`${method} ${path} answered ${a.status}, not ${status}: ${JSON.stringify(a.body).slice(0, 400)}`);
  return a.body;
}
