import type { DataSource } from 'typeorm';
import { z } from 'zod';
import {
  Accepted,
  LoginRequest,
  MeResponse,
  PasswordResetConfirm,
  PasswordResetRequest,
  RegisterRequest,
  SessionResponse,
  SwitchShopRequest,
} from '@gelpoint/contracts';
import { User } from '@gelpoint/db';
import { calendarUrlOf } from '../calendar/calendar-token';
import type { RouteRegistry } from '../../http/route-registry';
import { recordAudit } from '../audit/audit.service';
import { confirmPasswordReset, login, register, requestPasswordReset, type AuthSettings } from './auth.service';
import { clearSessionCookie, describeMe, openSession, revokeSession, revokeSessions, setSessionCookie } from './session.service';

export function authRoutes(api: RouteRegistry, ds: DataSource, s: AuthSettings): void {
  const ua = (req: { get(h: string): string | undefined }) => req.get('user-agent') ?? '';

  api.add(
    { method: 'post', path: '/auth/register', tag: 'auth', summary: 'Create a shop and its lead, and sign in', access: 'public', body: RegisterRequest, response: SessionResponse, status: 201 },
    async ({ body, req, res }) => {
      const session = await register(ds, s, body, ua(req));
      setSessionCookie(res, s, session);
      return session;
    },
  );

  api.add(
    { method: 'post', path: '/auth/login', tag: 'auth', summary: 'Sign in with e-mail and password', access: 'public', body: LoginRequest, response: SessionResponse },
    async ({ body, req, res }) => {
      const session = await login(ds, s, body, ua(req));
      setSessionCookie(res, s, session);
      return session;
    },
  );

  api.add({ method: 'post', path: '/auth/logout', tag: 'auth', summary: 'Sign out: ends this session for good', access: 'member' }, async ({ auth, res }) => {
    await ds.transaction(async (m) => {
      await revokeSession(m, auth.sessionId);
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'session.close', objectType: 'user', objectId: auth.userId });
    });
    clearSessionCookie(res, s);
    return undefined;
  });

  api.add(
    { method: 'post', path: '/auth/logout-everywhere', tag: 'auth', summary: 'Sign out of every device', access: 'member' },
    async ({ auth, res }) => {
      await ds.transaction((m) => revokeSessions(m, { userId: auth.userId }));
      clearSessionCookie(res, s);
      return undefined;
    },
  );

  api.add({ method: 'get', path: '/me', tag: 'auth', summary: 'Who is signed in, in which shop, with which role, and their calendar feed', access: 'member', response: MeResponse }, ({ auth }) =>
    ds.transaction(async (m) => describeMe(m, auth.userId, auth.shopId, auth.role, await calendarUrlOf(m, auth.userId, auth.shopId, s.jwtSecret, s.publicUrl))),
  );

  api.add(
    { method: 'post', path: '/auth/switch-shop', tag: 'auth', summary: 'Work in another of your shops (a new session replaces this one)', access: 'member', body: SwitchShopRequest, response: SessionResponse },
    async ({ auth, body, req, res }) =>
      ds.transaction(async (m) => {
        const user = await m.findOneByOrFail(User, { id: auth.userId });
        const session = await openSession(m, s, user, body.shopId, ua(req));
        await revokeSession(m, auth.sessionId);
        setSessionCookie(res, s, session);
        return session;
      }),
  );

  api.add(
    { method: 'post', path: '/auth/password-reset', tag: 'auth', summary: 'E-mail a one-time link to choose a new password', access: 'public', body: PasswordResetRequest, response: Accepted, status: 202 },
    async ({ body }) => {
      await requestPasswordReset(ds, s, body.email);
      return { message: 'if an account uses that e-mail, a reset link is on its way' };
    },
  );

  api.add(
    { method: 'post', path: '/auth/password-reset/confirm', tag: 'auth', summary: 'Set a new password with the e-mailed token; ends every session', access: 'public', body: PasswordResetConfirm, response: z.undefined() },
    async ({ body }) => {
      await confirmPasswordReset(ds, body);
      return undefined;
    },
  );
}
