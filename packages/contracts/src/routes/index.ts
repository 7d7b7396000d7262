import { auditRoutes } from './audit';
import { authRoutes } from './auth';
import { calendarRoutes } from './calendar';
import { exothermRoutes } from './exotherm';
import { healthRoutes } from './health';
import { moldRoutes } from './molds';
import { pieceRoutes } from './pieces';
import { pourPlanRoutes } from './pour-plans';
import { pourExportRoutes, pourRoutes } from './pours';
import { shelfRoutes } from './shelf';
import { shopRoutes } from './shop';
import { teamRoutes } from './team';

export * from './route';
export {
  auditRoutes,
  authRoutes,
  calendarRoutes,
  exothermRoutes,
  healthRoutes,
  moldRoutes,
  pieceRoutes,
  pourPlanRoutes,
  pourExportRoutes,
  pourRoutes,
  shelfRoutes,
  shopRoutes,
  teamRoutes,
};
export { CalendarFeedParams, CalendarUrl } from './calendar';
export { CureCheckParams, LoggedBatch } from './pours';

/** Every endpoint of the HTTP API by name, in the order the API registers them. */
export const apiRoutes = {
  ...healthRoutes,
  ...authRoutes,
  ...shopRoutes,
  ...teamRoutes,
  ...pieceRoutes,
  ...auditRoutes,
  ...shelfRoutes,
  ...moldRoutes,
  ...pourPlanRoutes,
  ...exothermRoutes,
  ...pourRoutes,
  ...pourExportRoutes,
  ...calendarRoutes,
};

export type ApiRoutes = typeof apiRoutes;
export type RouteName = keyof ApiRoutes;
