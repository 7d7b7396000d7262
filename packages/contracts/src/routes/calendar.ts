import { z } from 'zod';
import { route } from './route';

// The feed's token is its key, like an invitation's: a bearer capability in the path.
export const CalendarFeedParams = z.object({ token: z.string().max(200) });
export const CalendarUrl = z.object({ calendarUrl: z.string() });

export const calendarRoutes = {
  calendarFeed: route({
    method: 'get',
    path: '/calendar/:token',
    tag: 'calendar',
    summary: "A member's private calendar feed (text/calendar, RFC 5545): the shop's coming pour steps. The URL is the key; no sign-in.",
    access: 'public',
    params: CalendarFeedParams,
    raw: true,
  }),
  rotateCalendar: route({
    method: 'post',
    path: '/me/calendar/rotate',
    tag: 'calendar',
    summary: 'Replace your calendar feed URL: the old one answers 404 from now on',
    access: 'member',
    response: CalendarUrl,
  }),
};
