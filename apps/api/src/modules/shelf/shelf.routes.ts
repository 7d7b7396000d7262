import type { DataSource } from 'typeorm';
import { Pigment, ResinSystem } from '@gelpoint/db';
import { shelfRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { Catalogue } from './catalogue.service';
import { pigmentSortColumns, resinSystemSortColumns } from './catalogue-sort';
import { lotUses } from './lot-use.service';
import { createLot, deleteLot, getLot, listLots, updateLot } from './lots.service';
import { pigmentView, resinSystemColumns, resinSystemView } from './shelf-views';

export function shelfRoutes(api: RouteRegistry, ds: DataSource, now: () => Date = () => new Date()): void {
  const resins = new Catalogue(ds, ResinSystem, 'resin_system', resinSystemView, resinSystemSortColumns);
  const pigments = new Catalogue(ds, Pigment, 'pigment', pigmentView, pigmentSortColumns);

  api.implement(routes, {
    listResinSystems: ({ auth, query }) => resins.list(auth.shopId, query),
    createResinSystem: ({ auth, body }) => resins.create(auth, resinSystemColumns(body)),
    getResinSystem: ({ auth, params }) => resins.get(auth.shopId, params.id),
    replaceResinSystem: ({ auth, params, body }) => resins.replace(auth, params.id, resinSystemColumns(body)),
    archiveResinSystem: async ({ auth, params }) => {
      await resins.archive(auth, params.id);
      return undefined;
    },

    listPigments: ({ auth, query }) => pigments.list(auth.shopId, query),
    createPigment: ({ auth, body }) => pigments.create(auth, body),
    getPigment: ({ auth, params }) => pigments.get(auth.shopId, params.id),
    replacePigment: ({ auth, params, body }) => pigments.replace(auth, params.id, body),
    archivePigment: async ({ auth, params }) => {
      await pigments.archive(auth, params.id);
      return undefined;
    },

    listLots: ({ auth, query }) => listLots(ds, auth.shopId, query, now()),
    createLot: ({ auth, body }) => createLot(ds, auth, body),
    getLot: ({ auth, params }) => getLot(ds, auth.shopId, params.id, now()),
    updateLot: ({ auth, params, body }) => updateLot(ds, auth, params.id, body),
    deleteLot: async ({ auth, params }) => {
      await deleteLot(ds, auth, params.id);
      return undefined;
    },
    lotUses: ({ auth, params, query }) => lotUses(ds, auth.shopId, params.id, query),
  });
}
