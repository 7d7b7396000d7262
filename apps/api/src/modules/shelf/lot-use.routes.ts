import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { Id, LotUse, LotUsesQuery, Page } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { lotUses } from './lot-use.service';

export function lotUseRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add(
    { method: 'get', path: '/shelf/lots/:id/uses', tag: 'shelf', summary: 'Every batch mixed from a lot, newest first: pour, piece, grams weighed, who mixed it and when', access: 'member', params: z.object({ id: Id }), query: LotUsesQuery, response: Page(LotUse) },
    ({ auth, params, query }) => lotUses(ds, auth.shopId, params.id, query),
  );
}
