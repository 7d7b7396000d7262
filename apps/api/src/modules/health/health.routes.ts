import type { DataSource } from 'typeorm';
import { Health } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';

export function healthRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add({ method: 'get', path: '/health', tag: 'health', summary: 'Liveness and database reachability (503 when the database is down)', access: 'public', response: Health }, async ({ res }) => {
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
  });
}
