import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError } from './api-error';
import { buildUrl, createApiClient, csrfHeaderName, idempotencyHeaderName, isSafeMethod } from './api-client';

interface Sent {
  url: string;
  init: RequestInit;
}

function fakeFetch(answer: () => Response) {
  const sent: Sent[] = [];
  const fetchImpl: typeof fetch = async (input, init) => {
    sent.push({ url: String(input), init: init ?? {} });
    return answer();
  };
  return { sent, fetchImpl };
}

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

const Thing = z.object({ id: z.string(), n: z.number() });

describe('isSafeMethod', () => {
  // RFC 9110 §9.2.1: GET and HEAD are safe; POST, PUT, PATCH (RFC 5789) and DELETE are not.
  it.each([
    ['GET', true],
    ['HEAD', true],
    ['POST', false],
    ['PUT', false],
    ['PATCH', false],
    ['DELETE', false],
  ] as const)('%s is safe: %s', (method, safe) => {
    expect(isSafeMethod(method)).toBe(safe);
  });
});

describe('buildUrl', () => {
  it('joins the base path and leaves out empty filters', () => {
    expect(buildUrl('/api/', 'pieces', { stage: 'curing', q: '', limit: 25, offset: undefined })).toBe('/api/pieces?stage=curing&limit=25');
  });

  it('encodes values so the WHATWG URL parser reads back exactly what was given', () => {
    const q = 'walnut & "black" 50% #2';
    const url = new URL(buildUrl('/api', '/pieces', { q }), 'https://shop.example');
    expect(url.pathname).toBe('/api/pieces');
    expect(url.searchParams.get('q')).toBe(q);
  });
});

describe('createApiClient', () => {
  it('sends the CSRF header and a JSON body on a POST, with same-origin credentials', async () => {
    const { sent, fetchImpl } = fakeFetch(() => json(201, { id: 'a', n: 1 }));
    const client = createApiClient({ basePath: '/api', fetch: fetchImpl });
    const result = await client.post('/things', { name: 'x' }, Thing);
    expect(result).toEqual({ id: 'a', n: 1 });
    const [call] = sent;
    const headers = new Headers(call?.init.headers);
    expect(call?.url).toBe('/api/things');
    expect(call?.init.method).toBe('POST');
    expect(call?.init.credentials).toBe('same-origin');
    expect(headers.get(csrfHeaderName)).toBe('1');
    expect(headers.get('Content-Type')).toBe('application/json');
    expect(call?.init.body).toBe('{"name":"x"}');
  });

  it('sends a body that is not JSON as it is, with its type or none (FormData sets its own boundary)', async () => {
    const { sent, fetchImpl } = fakeFetch(() => json(200, { id: 'a', n: 2 }));
    const client = createApiClient({ basePath: '/api', fetch: fetchImpl });
    expect(await client.postBody('/logs', 'time,tempC\n', 'text/csv', Thing)).toEqual({ id: 'a', n: 2 });
    const form = new FormData();
    form.append('stage', 'tack_free');
    await client.postBody('/checks', form, null, Thing);
    const [csv, multipart] = sent.map((c) => ({ headers: new Headers(c.init.headers), body: c.init.body }));
    expect(csv?.headers.get('Content-Type')).toBe('text/csv');
    expect(csv?.body).toBe('time,tempC\n');
    expect(multipart?.headers.has('Content-Type')).toBe(false);
    expect(multipart?.body).toBe(form);
    expect(multipart?.headers.get(csrfHeaderName)).toBe('1');
  });

  it('sends an Idempotency-Key on every POST: the one given, or a new one per call', async () => {
    const { sent, fetchImpl } = fakeFetch(() => json(201, { id: 'a', n: 1 }));
    const client = createApiClient({ basePath: '/api', fetch: fetchImpl });
    await client.post('/things', {}, Thing, { idempotencyKey: 'entry-1' });
    await client.post('/things', {}, Thing);
    await client.post('/things', {}, Thing);
    await client.get('/things/a', Thing);
    const keys = sent.map((c) => new Headers(c.init.headers).get(idempotencyHeaderName));
    expect(keys[0]).toBe('entry-1');
    expect(keys[1]).toMatch(/^[0-9a-f-]{36}$/);
    expect(keys[2]).not.toBe(keys[1]);
    expect(keys[3]).toBeNull();
  });

  it('does not send the CSRF header on a GET', async () => {
    const { sent, fetchImpl } = fakeFetch(() => json(200, { id: 'a', n: 1 }));
    await createApiClient({ basePath: '/api', fetch: fetchImpl }).get('/things/a', Thing);
    expect(new Headers(sent[0]?.init.headers).has(csrfHeaderName)).toBe(false);
  });

  it('sends the CSRF header on DELETE and accepts 204 without a body', async () => {
    const { sent, fetchImpl } = fakeFetch(() => new Response(null, { status: 204 }));
    await expect(createApiClient({ basePath: '/api', fetch: fetchImpl }).delete('/things/a')).resolves.toBeUndefined();
    expect(new Headers(sent[0]?.init.headers).get(csrfHeaderName)).toBe('1');
  });

  it('turns an error body into an ApiError with code, message and fields', async () => {
    const { fetchImpl } = fakeFetch(() =>
      json(400, {
        error: { code: 'invalid_input', message: 'Check the form.', fields: { email: 'email must look like name@example.com' } },
      }),
    );
    const failure = await createApiClient({ basePath: '/api', fetch: fetchImpl })
      .post('/auth/register', {}, Thing)
      .catch((error: unknown) => error);
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({
      status: 400,
      code: 'invalid_input',
      message: 'Check the form.',
      fields: { email: 'email must look like name@example.com' },
    });
  });

  it('refuses a 200 whose body does not match the contract', async () => {
    const { fetchImpl } = fakeFetch(() => json(200, { id: 'a' }));
    const failure = await createApiClient({ basePath: '/api', fetch: fetchImpl })
      .get('/things/a', Thing)
      .catch((error: unknown) => error);
    expect(failure).toMatchObject({ status: 200, code: 'unexpected_response' });
  });

  it('reports an unreachable server as status 0, and says so to whoever watches the connection', async () => {
    const fetchImpl: typeof fetch = async () => {
      throw new TypeError('fetch failed');
    };
    let told = 0;
    const failure = await createApiClient({ basePath: '/api', fetch: fetchImpl, onUnreachable: () => (told += 1) })
      .get('/things', Thing)
      .catch((error: unknown) => error);
    expect(failure).toMatchObject({ status: 0, code: 'network_unreachable' });
    expect(told).toBe(1);
  });

  it('does not count an answer with an error status as a lost connection', async () => {
    const { fetchImpl } = fakeFetch(() => json(503, { error: { code: 'unavailable', message: 'down for a moment' } }));
    let told = 0;
    const failure = await createApiClient({ basePath: '/api', fetch: fetchImpl, onUnreachable: () => (told += 1) })
      .get('/things', Thing)
      .catch((error: unknown) => error);
    expect(failure).toMatchObject({ status: 503 });
    expect(told).toBe(0);
  });

  it('lets a cancellation through untouched', async () => {
    const controller = new AbortController();
    const abortError = new DOMException('aborted', 'AbortError');
    const fetchImpl: typeof fetch = async () => {
      throw abortError;
    };
    controller.abort();
    let told = 0;
    const failure = await createApiClient({ basePath: '/api', fetch: fetchImpl, onUnreachable: () => (told += 1) })
      .get('/things', Thing, { signal: controller.signal })
      .catch((error: unknown) => error);
    expect(failure).toBe(abortError);
    expect(told).toBe(0);
  });
});
