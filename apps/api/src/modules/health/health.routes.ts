import type { DataSource } from 'typeorm';
import { healthRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';

export function healthRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    health: async ({ res }) => {
      let database: 'up' | 'down' = 'up';
      try {
        await Promise.race([ds.query('SELECT 1'), new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 2000))]);
      } catch {
        database = 'down';
      }
      const body = { status: database === 'up' ? 'ok' : 'degraded', database, uptimeS: Math.round(process.uptime()) } as const;
      if (database === 'down') res.status(503);
      res.json(body);
      return body;
    },
  });
}
