import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { addressKey, sharedLimit } from '../../http/rate-limits';

export interface AuthLimits {
  perAddress: RequestHandler;
  perAccount: RequestHandler;
}

// Brute-force guard (OWASP ASVS 6.3.1): per address, and per account so that spreading the guesses
// over many addresses does not help. Counted in PostgreSQL: a second API instance sees the same count.
function authLimits(ds: DataSource, name: string, perWindow: number, countFailuresOnly: boolean): AuthLimits {
  const common = { windowMs: 15 * 60_000, code: 'too_many_attempts', what: 'attempts', countFailuresOnly } as const;
  return {
    perAddress: sharedLimit(ds, { ...common, name: `${name}-address`, limit: perWindow * 3, key: addressKey }),
    perAccount: sharedLimit(ds, {
      ...common,
      name: `${name}-account`,
      limit: perWindow,
      key: (req) => {
        const email = (req.body as { email?: unknown } | undefined)?.email;
        return typeof email === 'string' ? `account:${email.trim().toLowerCase()}` : addressKey(req);
      },
    }),
  };
}

/** Sign-in, registration and accepting an invitation: wrong guesses and refused forms count, successes do not. */
export const signInLimits = (ds: DataSource, perWindow: number): AuthLimits => authLimits(ds, 'sign-in', perWindow, true);

/** Reset requests always answer 202 (no account is revealed), so every request counts: no flood of mail to one person. */
export const resetLimits = (ds: DataSource, perWindow: number): AuthLimits => authLimits(ds, 'reset', perWindow, false);
