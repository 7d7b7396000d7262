import { ErrorBody } from '@gelpoint/contracts';

/** A failed API call: the HTTP status (0 when the server was not reached), a stable code and a sentence for people. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: string;
  readonly fields: Readonly<Record<string, string>>;

  constructor(status: number, code: string, message: string, fields: Readonly<Record<string, string>> = {}) {
    super(message);
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

export function hasStatus(error: unknown, status: number): error is ApiError {
  return isApiError(error) && error.status === status;
}

const fallbackByStatus: Record<number, { code: string; message: string }> = {
  400: { code: 'bad_request', message: 'The server could not use what was sent. Check the form and try again.' },
  401: { code: 'unauthenticated', message: 'Your session has ended. Sign in again to carry on.' },
  403: { code: 'forbidden', message: "Your role can't do this. Ask your shop lead if it needs doing." },
  404: { code: 'not_found', message: 'That item does not exist any more, or the link is wrong.' },
  409: { code: 'conflict', message: 'Someone changed this at the same time. Reload the page and try again.' },
  413: { code: 'too_large', message: 'What was sent is too large for the server. Send something smaller.' },
  429: { code: 'rate_limited', message: 'Too many tries in a short time. Wait a minute and try again.' },
};

/** Builds the error for a non-2xx answer, preferring the API's own `{ error: { code, message, fields } }` body. */
export function errorFromResponse(status: number, bodyText: string): ApiError {
  const body = parseJson(bodyText);
  const parsed = ErrorBody.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError(status, code, message, fields ?? {});
  }
  const known = fallbackByStatus[status];
  if (known) return new ApiError(status, known.code, known.message);
  if (status >= 500) {
    return new ApiError(
      status,
      'server_error',
      `The server ran into a problem (status ${status}). Try again in a moment; if it keeps happening, tell your shop lead.`,
    );
  }
  return new ApiError(status, `http_${status}`, `The server refused the request (status ${status}). Reload the page and try again.`);
}

export function networkError(): ApiError {
  return new ApiError(0, 'network_unreachable', "Gelpoint can't reach its server. Check the connection and try again.");
}

export function unexpectedResponse(status: number): ApiError {
  return new ApiError(
    status,
    'unexpected_response',
    "The server's answer was not what this page expects. Reload the page; if it keeps happening, tell your shop lead.",
  );
}

function parseJson(text: string): unknown {
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
