import type { DataSource } from 'typeorm';
import { healthRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { databaseReachable } from './health.queries';

export function healthRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    health: async ({ res }) => {
      const database = (await databaseReachable(ds, 2000)) ? 'up' : 'down';
      const body = { status: database === 'up' ? 'ok' : 'degraded', database, uptimeS: Math.round(process.uptime()) } as const;
      if (database === 'down') res.status(503);
      res.json(body);
      return body;
    },
  });
}
