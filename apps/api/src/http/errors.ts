import type { ErrorRequestHandler } from 'express';
import type { Logger } from 'pino';
import { ZodError } from 'zod';

export type ErrorKind =
  | 'bad_request'
  | 'unauthorized'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'gone'
  | 'payload_too_large'
  | 'unprocessable'
  | 'too_many_requests'
  | 'unavailable';

const statusOf: Record<ErrorKind, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unprocessable: 422,
  too_many_requests: 429,
  unavailable: 503,
};

/** A failure the caller can act on: a code for programs, a sentence for people, a kind for the status. */
export class AppError extends Error {
  constructor(
    readonly kind: ErrorKind,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
  get status(): number {
    return statusOf[this.kind];
  }
}

export const notFound = (what: string) => new AppError('not_found', 'not_found', `no such ${what} in this shop`);

export function fromZod(err: ZodError, where: 'body' | 'query' | 'path'): AppError {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join('.') : where;
    fields[key] ??= issue.message;
  }
  const first = err.issues[0];
  const label = first && first.path.length ? `${first.path.join('.')}: ` : '';
  const unknownKeys = first?.code === 'unrecognized_keys' ? ` (${first.keys.join(', ')})` : '';
  return new AppError('bad_request', 'invalid_input', `invalid ${where} — ${label}${first?.message ?? 'not valid'}${unknownKeys}`, fields);
}

// SQLSTATE (PostgreSQL manual, appendix A): class 08 connection exceptions, 57P01–57P05 the server
// shutting down, restarting or not yet accepting connections, 53300 too many connections.
const PG_UNAVAILABLE = /^(08...|57P0[1-5]|53300)$/;
// Socket errors on the way to the database host: refused, reset, unreachable, timed out, unresolvable.
const NET_UNAVAILABLE = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'EPIPE', 'ENOTFOUND', 'EAI_AGAIN']);
// node-postgres and its pool say these in words only.
const DRIVER_UNAVAILABLE = /Connection terminated|timeout exceeded when trying to connect|connect ECONNREFUSED|not queryable/;

interface DriverFailure {
  code?: unknown;
  message?: unknown;
  /** TypeORM's QueryFailedError keeps the driver's own error here. */
  driverError?: unknown;
  /** A connection tried on several addresses fails with an AggregateError of each attempt. */
  errors?: unknown;
}

function isDatabaseDown(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 3) return false;
  const e = err as DriverFailure;
  if (typeof e.code === 'string' && (PG_UNAVAILABLE.test(e.code) || NET_UNAVAILABLE.has(e.code))) return true;
  if (typeof e.message === 'string' && DRIVER_UNAVAILABLE.test(e.message)) return true;
  if (isDatabaseDown(e.driverError, depth + 1)) return true;
  return Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseDown(inner, depth + 1));
}

/**
 * PostgreSQL refuses text it cannot store: a NUL character (U+0000) in text, or the escape \u0000 in
 * jsonb. That is the caller's input, so it is a 400, and the transaction it broke has rolled back.
 */
const PG_UNSTORABLE_TEXT = new Set(['22021', '22P05']);

/** Numbers and times past what a column holds (22003 numeric, 22008 date/time, 22009 time zone offset). */
const PG_OUT_OF_RANGE = new Set(['22003', '22008', '22009']);

function fromUnstorableInput(err: unknown): AppError | undefined {
  const e = err as { code?: string } | undefined;
  if (!e?.code) return undefined;
  if (PG_UNSTORABLE_TEXT.has(e.code))
    return new AppError('bad_request', 'invalid_text', 'the request contains a NUL character (U+0000), which text cannot hold; remove it and send again');
  if (PG_OUT_OF_RANGE.has(e.code))
    return new AppError(
      'bad_request',
      'value_out_of_range',
      'a number or time in the request is outside what can be stored; check its size, its year and its time-zone offset',
    );
  // 23505: two requests at once made the same unique thing; the services check first, this is the race.
  if (e.code === '23505') return new AppError('conflict', 'already_exists', 'that already exists (another request made it a moment ago); reload and try again');
  return undefined;
}

/** Turns body-parser's own errors (bad JSON, too large) into ours. */
function fromBodyParser(err: unknown): AppError | undefined {
  const e = err as { type?: string } | undefined;
  if (e?.type === 'entity.parse.failed') return new AppError('bad_request', 'malformed_json', 'the request body is not valid JSON');
  if (e?.type === 'entity.too.large') return new AppError('payload_too_large', 'body_too_large', 'the request body is too large');
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported')
    return new AppError('bad_request', 'unsupported_encoding', 'send the body as UTF-8 JSON');
  return undefined;
}

/**
 * Other 4xx errors the HTTP layer raises in the http-errors style (a `status` and `expose: true`): a path
 * with a broken %-escape, a body whose Content-Encoding does not match its bytes, a file path the static
 * server refuses. They are the request's fault, so they keep their status and get a sentence.
 */
function fromHttpLayer(err: unknown): AppError | undefined {
  const e = err as { status?: unknown; statusCode?: unknown; expose?: unknown; code?: unknown } | undefined;
  const status = typeof e?.status === 'number' ? e.status : typeof e?.statusCode === 'number' ? e.statusCode : undefined;
  // The router marks a path parameter it cannot decode with status 400 but without expose.
  if (err instanceof URIError && status === 400)
    return new AppError('bad_request', 'bad_path', 'the address holds a broken %-escape (a % must be followed by two hex digits); fix the link');
  if (status === undefined || status < 400 || status >= 500 || e?.expose !== true) return undefined;
  if (status === 403 || status === 404) return new AppError('not_found', 'not_found', 'there is nothing to serve at this address');
  if (typeof e?.code === 'string' && e.code.startsWith('Z_'))
    return new AppError('bad_request', 'bad_encoding', 'the body does not match its Content-Encoding; send it uncompressed, or compressed as the header says');
  return new AppError('bad_request', 'bad_request', 'the request could not be read; check its headers and body');
}

export function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return fromZod(err, 'body');
  if (isDatabaseDown(err)) return new AppError('unavailable', 'database_unavailable', 'the database is not reachable right now; try again in a moment');
  return fromUnstorableInput(err) ?? fromBodyParser(err) ?? fromHttpLayer(err);
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const known = toAppError(err);
    if (known) {
      if (known.kind === 'unavailable') logger.warn({ err, path: req.path }, known.message);
      if (known.kind === 'unavailable') res.setHeader('Retry-After', '5');
      res.status(known.status).json({ error: { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}) } });
      return;
    }
    logger.error({ err, path: req.path }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'something went wrong on our side; it has been logged' } });
  };
}
