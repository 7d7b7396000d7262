import type { ZodType } from 'zod';
import { env } from '../config/env';
import { errorFromResponse, networkError, unexpectedResponse } from './api-error';
import { newIdempotencyKey } from './idempotency-key';
import { connection } from './offline/connection';

export const csrfHeaderName = 'X-Gelpoint-Csrf';
export const idempotencyHeaderName = 'Idempotency-Key';

export type HttpMethod = 'GET' | 'HEAD' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** RFC 9110 §9.2.1 safe methods; every other method changes state and must carry the CSRF header. */
export function isSafeMethod(method: HttpMethod): boolean {
  return method === 'GET' || method === 'HEAD';
}

export type QueryValue = string | number | boolean | null | undefined;

export function buildUrl(basePath: string, path: string, query?: Readonly<Record<string, QueryValue>>): string {
  const base = basePath.replace(/\/+$/, '');
  const tail = path.startsWith('/') ? path : `/${path}`;
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === '') continue;
    search.append(name, String(value));
  }
  const qs = search.toString();
  return qs ? `${base}${tail}?${qs}` : `${base}${tail}`;
}

export interface RequestOptions {
  query?: Readonly<Record<string, QueryValue>>;
  signal?: AbortSignal;
  /**
   * Sent with every POST (a new one per call when not given): a create the server did receive, sent again with the
   * same key, answers its first answer instead of making a second record. The phone's outbox keeps an entry's key.
   */
  idempotencyKey?: string;
}

export interface ApiClient {
  get<T>(path: string, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
  post<T>(path: string, body: unknown, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
  patch<T>(path: string, body: unknown, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
  /** A full replacement: the API stores the body as the whole new entry. */
  put<T>(path: string, body: unknown, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
  /**
   * A POST whose body is not JSON (a CSV log, a multipart form with a photo). With a null content type the browser
   * sets it itself, as it must for FormData (the multipart boundary).
   */
  postBody<T>(path: string, body: BodyInit, contentType: string | null, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
  /** For answers without content (204), such as sign-out or a password change. */
  postWithoutContent(path: string, body?: unknown, options?: RequestOptions): Promise<void>;
  delete(path: string, options?: RequestOptions): Promise<void>;
  /** A DELETE that says why (a void with its reason) and answers what it changed. */
  deleteWith<T>(path: string, body: unknown, schema: ZodType<T>, options?: RequestOptions): Promise<T>;
}

export interface ApiClientConfig {
  basePath: string;
  fetch?: typeof fetch;
  /** Told when a request did not reach the server at all (no answer, not an error status). */
  onUnreachable?: () => void;
}

interface Payload {
  body: BodyInit;
  contentType: string | null;
}

const asJson = (body: unknown): Payload | undefined => (body === undefined ? undefined : { body: JSON.stringify(body), contentType: 'application/json' });

export function createApiClient(config: ApiClientConfig): ApiClient {
  const send = async (method: HttpMethod, path: string, payload: Payload | undefined, options: RequestOptions = {}): Promise<Response> => {
    const headers = new Headers({ Accept: 'application/json' });
    if (!isSafeMethod(method)) headers.set(csrfHeaderName, '1');
    if (method === 'POST') headers.set(idempotencyHeaderName, options.idempotencyKey ?? newIdempotencyKey());
    const init: RequestInit = { method, headers, credentials: 'same-origin' };
    if (payload) {
      if (payload.contentType) headers.set('Content-Type', payload.contentType);
      init.body = payload.body;
    }
    if (options.signal) init.signal = options.signal;

    const doFetch = config.fetch ?? globalThis.fetch;
    let response: Response;
    try {
      response = await doFetch(buildUrl(config.basePath, path, options.query), init);
    } catch (error) {
      // A cancelled query must stay a cancellation, so the query library can tell it apart from a failure.
      if (options.signal?.aborted) throw error;
      config.onUnreachable?.();
      throw networkError();
    }
    if (!response.ok) throw errorFromResponse(response.status, await response.text());
    return response;
  };

  const readAs = async <T>(response: Response, schema: ZodType<T>): Promise<T> => {
    const text = await response.text();
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      throw unexpectedResponse(response.status);
    }
    const parsed = schema.safeParse(json);
    if (!parsed.success) throw unexpectedResponse(response.status);
    return parsed.data;
  };

  return {
    get: async (path, schema, options) => readAs(await send('GET', path, undefined, options), schema),
    post: async (path, body, schema, options) => readAs(await send('POST', path, asJson(body), options), schema),
    patch: async (path, body, schema, options) => readAs(await send('PATCH', path, asJson(body), options), schema),
    put: async (path, body, schema, options) => readAs(await send('PUT', path, asJson(body), options), schema),
    postBody: async (path, body, contentType, schema, options) => readAs(await send('POST', path, { body, contentType }, options), schema),
    postWithoutContent: async (path, body, options) => {
      await send('POST', path, asJson(body), options);
    },
    delete: async (path, options) => {
      await send('DELETE', path, undefined, options);
    },
    deleteWith: async (path, body, schema, options) => readAs(await send('DELETE', path, asJson(body), options), schema),
  };
}

export const api: ApiClient = createApiClient({ basePath: env.apiBasePath, onUnreachable: connection.unreachable });
