import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import type { RequestHandler } from 'express';

// Brute-force guard (OWASP ASVS 6.3.1): per address, and per account so that spreading the guesses
// over many addresses does not help. The message says when to come back; Retry-After says it too.
const tooMany: Options['handler'] = (_req, res, _next, options) => {
  const retryAfterS = Number(res.getHeader('Retry-After') ?? options.windowMs / 1000);
  res.status(options.statusCode).json({
    error: { code: 'too_many_attempts', message: `too many attempts; wait ${Math.max(1, Math.ceil(retryAfterS / 60))} minute(s) and try again` },
  });
};

export function authRateLimits(perWindow: number): { perAddress: RequestHandler; perAccount: RequestHandler } {
  const windowMs = 15 * 60_000;
  const common = { windowMs, standardHeaders: 'draft-7', legacyHeaders: false, handler: tooMany } as const;
  return {
    perAddress: rateLimit({ ...common, limit: perWindow * 3, keyGenerator: (req) => ipKeyGenerator(req.ip ?? '') }),
    perAccount: rateLimit({
      ...common,
      limit: perWindow,
      keyGenerator: (req) => {
        const email = (req.body as { email?: unknown } | undefined)?.email;
        return typeof email === 'string' ? `account:${email.trim().toLowerCase()}` : `address:${ipKeyGenerator(req.ip ?? '')}`;
      },
    }),
  };
}
