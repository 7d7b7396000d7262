import type { DataSource } from 'typeorm';
import { z } from 'zod';
import type { RouteRegistry } from '../../http/route-registry';
import { AppError } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { lockedMembershipId, rotateCalendarToken } from './calendar-token';
import type { CalendarFeeds } from './calendar.service';

// The feed's token is its key, like an invitation's: a bearer capability in the path.
const FeedParams = z.object({ token: z.string().max(200) });
const CalendarUrl = z.object({ calendarUrl: z.string() });

export function calendarRoutes(api: RouteRegistry, ds: DataSource, feeds: CalendarFeeds, settings: { jwtSecret: string; publicUrl: string }): void {
  api.add(
    {
      method: 'get',
      path: '/calendar/:token',
      tag: 'calendar',
      summary: "A member's private calendar feed (text/calendar, RFC 5545): the shop's coming pour steps. The URL is the key; no sign-in.",
      access: 'public',
      params: FeedParams,
    },
    async ({ params, res }) => {
      const token = params.token.replace(/\.ics$/i, '');
      if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) throw new AppError('not_found', 'not_found', 'no such calendar feed; the link may have been replaced');
      const text = await feeds.feed(token);
      res.setHeader('Content-Type', 'text/calendar; charset=utf-8');
      res.setHeader('Content-Disposition', 'inline; filename="gelpoint.ics"');
      res.setHeader('Cache-Control', 'private, max-age=300');
      res.status(200).end(text);
      return undefined;
    },
  );
  api.add(
    { method: 'post', path: '/me/calendar/rotate', tag: 'calendar', summary: 'Replace your calendar feed URL: the old one answers 404 from now on', access: 'member', response: CalendarUrl },
    ({ auth }) =>
      ds.transaction(async (m) => {
        const membershipId = await lockedMembershipId(m, auth.userId, auth.shopId);
        if (!membershipId) throw new AppError('not_found', 'not_found', 'you are no longer a member of this shop');
        const calendarUrl = await rotateCalendarToken(m, membershipId, settings.jwtSecret, settings.publicUrl);
        await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'calendar.rotate', objectType: 'member', objectId: membershipId });
        return { calendarUrl };
      }),
  );
}
