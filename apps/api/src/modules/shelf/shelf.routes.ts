import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { Pigment, ResinSystem } from '@gelpoint/db';
import { Id, LotInput, LotListQuery, LotUpdate, LotView, Page, PigmentInput, PigmentListQuery, PigmentView, ResinSystemInput, ResinSystemListQuery, ResinSystemView } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { Catalogue } from './catalogue.service';
import { pigmentSortColumns, resinSystemSortColumns } from './catalogue-sort';
import { lotUseRoutes } from './lot-use.routes';
import { createLot, deleteLot, getLot, listLots, updateLot } from './lots.service';
import { pigmentView, resinSystemColumns, resinSystemView } from './shelf-views';

const IdParams = z.object({ id: Id });

export function shelfRoutes(api: RouteRegistry, ds: DataSource, now: () => Date = () => new Date()): void {
  const resins = new Catalogue(ds, ResinSystem, 'resin_system', resinSystemView, resinSystemSortColumns);
  const pigments = new Catalogue(ds, Pigment, 'pigment', pigmentView, pigmentSortColumns);

  const base = '/shelf/resin-systems';
  api.add({ method: 'get', path: base, tag: 'shelf', summary: 'Resin systems on the shelf, sorted by the chosen column (name unless told), then paged', access: 'member', query: ResinSystemListQuery, response: Page(ResinSystemView) }, ({ auth, query }) =>
    resins.list(auth.shopId, query),
  );
  api.add({ method: 'post', path: base, tag: 'shelf', summary: 'Add a resin system from its data sheet', access: ['lead'], body: ResinSystemInput, response: ResinSystemView, status: 201, idempotent: true }, ({ auth, body }) =>
    resins.create(auth, resinSystemColumns(body)),
  );
  api.add({ method: 'get', path: `${base}/:id`, tag: 'shelf', summary: 'One resin system', access: 'member', params: IdParams, response: ResinSystemView }, ({ auth, params }) => resins.get(auth.shopId, params.id));
  api.add(
    { method: 'put', path: `${base}/:id`, tag: 'shelf', summary: 'Replace a resin system with corrected data-sheet values (saved plans keep theirs)', access: ['lead'], params: IdParams, body: ResinSystemInput, response: ResinSystemView },
    ({ auth, params, body }) => resins.replace(auth, params.id, resinSystemColumns(body)),
  );
  api.add({ method: 'delete', path: `${base}/:id`, tag: 'shelf', summary: 'Archive a resin system', access: ['lead'], params: IdParams }, async ({ auth, params }) => {
    await resins.archive(auth, params.id);
    return undefined;
  });

  const pig = '/shelf/pigments';
  api.add({ method: 'get', path: pig, tag: 'shelf', summary: 'Pigments on the shelf, sorted by the chosen column (name unless told), then paged', access: 'member', query: PigmentListQuery, response: Page(PigmentView) }, ({ auth, query }) => pigments.list(auth.shopId, query));
  api.add({ method: 'post', path: pig, tag: 'shelf', summary: 'Add a pigment', access: ['lead'], body: PigmentInput, response: PigmentView, status: 201, idempotent: true }, ({ auth, body }) => pigments.create(auth, body));
  api.add({ method: 'get', path: `${pig}/:id`, tag: 'shelf', summary: 'One pigment', access: 'member', params: IdParams, response: PigmentView }, ({ auth, params }) => pigments.get(auth.shopId, params.id));
  api.add({ method: 'put', path: `${pig}/:id`, tag: 'shelf', summary: 'Replace a pigment', access: ['lead'], params: IdParams, body: PigmentInput, response: PigmentView }, ({ auth, params, body }) =>
    pigments.replace(auth, params.id, body),
  );
  api.add({ method: 'delete', path: `${pig}/:id`, tag: 'shelf', summary: 'Archive a pigment', access: ['lead'], params: IdParams }, async ({ auth, params }) => {
    await pigments.archive(auth, params.id);
    return undefined;
  });

  const lots = '/shelf/lots';
  api.add({ method: 'get', path: lots, tag: 'shelf', summary: 'Lots on the shelf, sorted by the chosen column (soonest expiry unless told), then paged', access: 'member', query: LotListQuery, response: Page(LotView) }, ({ auth, query }) => listLots(ds, auth.shopId, query, now()));
  api.add({ method: 'post', path: lots, tag: 'shelf', summary: 'Receive a lot of part A, part B or a pigment', access: ['lead'], body: LotInput, response: LotView, status: 201, idempotent: true }, ({ auth, body }) => createLot(ds, auth, body));
  api.add({ method: 'get', path: `${lots}/:id`, tag: 'shelf', summary: 'One lot', access: 'member', params: IdParams, response: LotView }, ({ auth, params }) => getLot(ds, auth.shopId, params.id, now()));
  api.add({ method: 'patch', path: `${lots}/:id`, tag: 'shelf', summary: 'Correct a lot (number, remaining stock, expiry, notes)', access: ['lead'], params: IdParams, body: LotUpdate, response: LotView }, ({ auth, params, body }) =>
    updateLot(ds, auth, params.id, body),
  );
  api.add({ method: 'delete', path: `${lots}/:id`, tag: 'shelf', summary: 'Remove a lot entered by mistake', access: ['lead'], params: IdParams }, async ({ auth, params }) => {
    await deleteLot(ds, auth, params.id);
    return undefined;
  });
  lotUseRoutes(api, ds);
}
