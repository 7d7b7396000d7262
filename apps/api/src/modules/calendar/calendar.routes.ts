import type { DataSource } from 'typeorm';
import { calendarRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { AppError } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { lockedMembershipId, rotateCalendarToken } from './calendar-token';
import type { CalendarFeeds } from './calendar.service';

export function calendarRoutes(api: RouteRegistry, ds: DataSource, feeds: CalendarFeeds, settings: { jwtSecret: string; publicUrl: string }): void {
  api.implement(routes, {
    calendarFeed: async ({ params, res }) => {
      const token = params.token.replace(/\.ics$/i, '');
      if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) throw new AppError('not_found', 'not_found', 'no such calendar feed; the link may have been replaced');
      const text = await feeds.feed(token);
      res.setHeader('Content-Type', 'text/calendar; charset=utf-8');
      res.setHeader('Content-Disposition', 'inline; filename="gelpoint.ics"');
      res.setHeader('Cache-Control', 'private, max-age=300');
      res.status(200).end(text);
      return undefined;
    },
    rotateCalendar: ({ auth }) =>
      ds.transaction(async (m) => {
        const membershipId = await lockedMembershipId(m, auth.userId, auth.shopId);
        if (!membershipId) throw new AppError('not_found', 'not_found', 'you are no longer a member of this shop');
        const calendarUrl = await rotateCalendarToken(m, membershipId, settings.jwtSecret, settings.publicUrl);
        await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'calendar.rotate', objectType: 'member', objectId: membershipId });
        return { calendarUrl };
      }),
  });
}
