import type { ZodType } from 'zod';
import { env } from '../../../config/env';
import { buildUrl, csrfHeaderName } from '../../../lib/api-client';
import { errorFromResponse, networkError, unexpectedResponse } from '../../../lib/api-error';

/**
 * A POST whose body is not JSON (a CSV log, a multipart form with a photo), with the same CSRF header and the same
 * reading of answers and errors as the shared client. For FormData the browser sets the multipart boundary itself.
 */
export async function postRaw<T>(path: string, body: BodyInit, contentType: string | null, schema: ZodType<T>): Promise<T> {
  const headers = new Headers({ Accept: 'application/json', [csrfHeaderName]: '1' });
  if (contentType) headers.set('Content-Type', contentType);
  let response: Response;
  try {
    response = await fetch(buildUrl(env.apiBasePath, path), { method: 'POST', headers, body, credentials: 'same-origin' });
  } catch {
    throw networkError();
  }
  const text = await response.text();
  if (!response.ok) throw errorFromResponse(response.status, text);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw unexpectedResponse(response.status);
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) throw unexpectedResponse(response.status);
  return parsed.data;
}
