import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { PostgresRateLimitStore } from './rate-limit-store';

/** A 429 whose message says when to come back; Retry-After (and RateLimit, draft 7) say it too. */
export function tooManyHandler(code: string, what: string): Options['handler'] {
  return (_req, res, _next, options) => {
    const retryAfterS = Number(res.getHeader('Retry-After') ?? options.windowMs / 1000);
    res.status(options.statusCode).json({
      error: { code, message: `too many ${what}; wait ${Math.max(1, Math.ceil(retryAfterS / 60))} minute(s) and try again` },
    });
  };
}

export interface LimitSpec {
  /** Names the counter in the shared store; two limits never share a name. */
  name: string;
  limit: number;
  windowMs: number;
  code: string;
  what: string;
  key: (req: Parameters<RequestHandler>[0], res: Parameters<RequestHandler>[1]) => string;
  /** Count only what failed (a sign-in guard counts wrong guesses, not members signing in). */
  countFailuresOnly?: boolean;
}

/** A limit counted in PostgreSQL, so every API instance sees the same count. */
export function sharedLimit(ds: DataSource, spec: LimitSpec): RequestHandler {
  return rateLimit({
    windowMs: spec.windowMs,
    limit: spec.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(ds, `${spec.name}:`),
    handler: tooManyHandler(spec.code, spec.what),
    keyGenerator: spec.key,
    skipSuccessfulRequests: spec.countFailuresOnly ?? false,
  });
}

export const addressKey = (req: Parameters<RequestHandler>[0]): string => `address:${ipKeyGenerator(req.ip ?? '')}`;

/**
 * Costly work (uploads that are parsed and analysed, photos, imports) limited per member (OWASP ASVS 2.4.1).
 * The route registry names the signed-in member in res.locals before a route's middleware runs.
 */
export function perMemberLimit(ds: DataSource, perHour: number): RequestHandler {
  return sharedLimit(ds, {
    name: 'uploads',
    limit: perHour,
    windowMs: 60 * 60_000,
    code: 'too_many_uploads',
    what: 'uploads from your account',
    key: (req, res) => {
      const memberId = (res.locals as { memberId?: unknown }).memberId;
      return typeof memberId === 'string' ? `member:${memberId}` : addressKey(req);
    },
  });
}
