import type { DataSource } from 'typeorm';
import { authRoutes as routes } from '@gelpoint/contracts';
import { User } from '@gelpoint/db';
import { calendarUrlOf } from '../calendar/calendar-token';
import type { RouteRegistry } from '../../http/route-registry';
import { recordAudit } from '../audit/audit.service';
import { confirmPasswordReset, login, register, requestPasswordReset, type AuthSettings } from './auth.service';
import { clearSessionCookie, describeMe, openSession, revokeSession, revokeSessions, setSessionCookie } from './session.service';

export function authRoutes(api: RouteRegistry, ds: DataSource, s: AuthSettings): void {
  const ua = (req: { get(h: string): string | undefined }) => req.get('user-agent') ?? '';

  api.implement(routes, {
    register: async ({ body, req, res }) => {
      const session = await register(ds, s, body, ua(req));
      setSessionCookie(res, s, session);
      return session;
    },
    login: async ({ body, req, res }) => {
      const session = await login(ds, s, body, ua(req));
      setSessionCookie(res, s, session);
      return session;
    },
    logout: async ({ auth, res }) => {
      await ds.transaction(async (m) => {
        await revokeSession(m, auth.sessionId);
        await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'session.close', objectType: 'user', objectId: auth.userId });
      });
      clearSessionCookie(res, s);
      return undefined;
    },
    logoutEverywhere: async ({ auth, res }) => {
      await ds.transaction((m) => revokeSessions(m, { userId: auth.userId }));
      clearSessionCookie(res, s);
      return undefined;
    },
    me: ({ auth }) =>
      ds.transaction(async (m) =>
        describeMe(m, auth.userId, auth.shopId, auth.role, await calendarUrlOf(m, auth.userId, auth.shopId, s.jwtSecret, s.publicUrl)),
      ),
    switchShop: async ({ auth, body, req, res }) =>
      ds.transaction(async (m) => {
        const user = await m.findOneByOrFail(User, { id: auth.userId });
        const session = await openSession(m, s, user, body.shopId, ua(req));
        await revokeSession(m, auth.sessionId);
        setSessionCookie(res, s, session);
        return session;
      }),
    requestPasswordReset: async ({ body }) => {
      await requestPasswordReset(ds, s, body.email);
      return { message: 'if an account uses that e-mail, a reset link is on its way' };
    },
    confirmPasswordReset: async ({ body }) => {
      await confirmPasswordReset(ds, body);
      return undefined;
    },
  });
}
