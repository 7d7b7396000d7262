import { createSecretKey, type KeyObject } from 'node:crypto';
import type { Request } from 'express';
import jwt from 'jsonwebtoken';
import type { DataSource } from 'typeorm';
import type { Role } from '@gelpoint/contracts';
import { AppError } from './errors';

export const SESSION_COOKIE = 'gp_session';

export interface AuthContext {
  sessionId: string;
  userId: string;
  userName: string;
  userEmail: string;
  shopId: string;
  role: Role;
  via: 'bearer' | 'cookie';
}

interface TokenClaims {
  sub: string;
  sid: string;
}

// Given a string, jsonwebtoken first tries to read it as a PEM public key on every call, and that failed
// attempt was the largest single cost of an authenticated request; a key object skips it.
const keys = new Map<string, KeyObject>();
function signingKey(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) keys.set(secret, (key = createSecretKey(Buffer.from(secret, 'utf8'))));
  return key;
}

export function signSessionToken(secret: string, claims: TokenClaims, expiresAt: Date): string {
  return jwt.sign({ sid: claims.sid }, signingKey(secret), {
    algorithm: 'HS256',
    subject: claims.sub,
    expiresIn: Math.max(1, Math.floor((expiresAt.getTime() - Date.now()) / 1000)),
    issuer: 'gelpoint',
    audience: 'gelpoint-api',
  });
}

function tokenFrom(req: Request): { token: string; via: AuthContext['via'] } | undefined {
  const header = req.get('authorization');
  if (header) {
    const m = /^Bearer\s+(\S+)$/i.exec(header);
    if (!m) throw new AppError('unauthorized', 'bad_authorization', 'the Authorization header must be "Bearer <token>"');
    return { token: m[1]!, via: 'bearer' };
  }
  const cookie = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  return cookie ? { token: cookie, via: 'cookie' } : undefined;
}

const signedOut = () => new AppError('unauthorized', 'signed_out', 'you are not signed in (or the session ended); sign in again');

/**
 * Resolves the caller from the token, then from the database: the signature alone is not enough,
 * because a signed-out session or a disabled member must stop working at once.
 */
export async function authenticate(req: Request, ds: DataSource, secret: string): Promise<AuthContext | undefined> {
  const found = tokenFrom(req);
  if (!found) return undefined;
  let claims: TokenClaims;
  try {
    const payload = jwt.verify(found.token, signingKey(secret), { algorithms: ['HS256'], issuer: 'gelpoint', audience: 'gelpoint-api' });
    if (typeof payload === 'string' || typeof payload.sub !== 'string' || typeof payload.sid !== 'string') throw signedOut();
    claims = { sub: payload.sub, sid: payload.sid };
  } catch (err) {
    if (err instanceof AppError) throw err;
    if (err instanceof jwt.TokenExpiredError) throw new AppError('unauthorized', 'session_expired', 'your session has expired; sign in again');
    throw new AppError('unauthorized', 'bad_token', 'the session token is not valid; sign in again');
  }
  const rows: { user_name: string; user_email: string; shop_id: string; role: Role }[] = await ds.query(
    `SELECT u.name AS user_name, u.email AS user_email, s.shop_id, m.role
       FROM sessions s
       JOIN users u ON u.id = s.user_id
       JOIN memberships m ON m.user_id = s.user_id AND m.shop_id = s.shop_id AND m.status = 'active'
      WHERE s.id = $1 AND s.user_id = $2 AND s.revoked_at IS NULL AND s.expires_at > now()`,
    [claims.sid, claims.sub],
  );
  const row = rows[0];
  if (!row) throw signedOut();
  return {
    sessionId: claims.sid,
    userId: claims.sub,
    userName: row.user_name,
    userEmail: row.user_email,
    shopId: row.shop_id,
    role: row.role,
    via: found.via,
  };
}
