import type { DataSource } from 'typeorm';
import { Health } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { databaseReachable } from './health.queries';

export function healthRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add({ method: 'get', path: '/health', tag: 'health', summary: 'Liveness and database reachability (503 when the database is down)', access: 'public', response: Health }, async ({ res }) => {
    const database = (await databaseReachable(ds, 2000)) ? 'up' : 'down';
    const body = { status: database === 'up' ? 'ok' : 'degraded', database, uptimeS: Math.round(process.uptime()) } as const;
    if (database === 'down') res.status(503);
    res.json(body);
    return body;
  });
}
