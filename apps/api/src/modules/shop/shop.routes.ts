import type { DataSource } from 'typeorm';
import { Shop as ShopRow } from '@gelpoint/db';
import { shopRoutes as routes } from '@gelpoint/contracts';
import { notFound } from '../../http/errors';
import type { RouteRegistry } from '../../http/route-registry';
import { recordAudit } from '../audit/audit.service';
import { shopView } from './shop-view';

export function shopRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    getShop: async ({ auth }) => {
      const shop = await ds.getRepository(ShopRow).findOneBy({ id: auth.shopId });
      if (!shop) throw notFound('shop');
      return shopView(shop);
    },
    updateShop: async ({ auth, body }) =>
      ds.transaction(async (m) => {
        const shop = await m.findOne(ShopRow, { where: { id: auth.shopId }, lock: { mode: 'pessimistic_write' } });
        if (!shop) throw notFound('shop');
        Object.assign(shop, body);
        await m.save(shop);
        await recordAudit(m, { shopId: shop.id, actor: auth, action: 'shop.update', objectType: 'shop', objectId: shop.id, detail: body });
        return shopView(shop);
      }),
  });
}
