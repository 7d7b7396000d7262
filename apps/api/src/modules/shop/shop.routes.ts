import type { DataSource } from 'typeorm';
import { Shop as ShopRow } from '@gelpoint/db';
import { Shop, UpdateShopRequest } from '@gelpoint/contracts';
import { notFound } from '../../http/errors';
import type { RouteRegistry } from '../../http/route-registry';
import { recordAudit } from '../audit/audit.service';
import { shopView } from './shop-view';

export function shopRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add({ method: 'get', path: '/shop', tag: 'shop', summary: 'The current shop and its settings', access: 'member', response: Shop }, async ({ auth }) => {
    const shop = await ds.getRepository(ShopRow).findOneBy({ id: auth.shopId });
    if (!shop) throw notFound('shop');
    return shopView(shop);
  });

  api.add(
    { method: 'patch', path: '/shop', tag: 'shop', summary: 'Change the shop name, units, scale resolution, currency or cure-log settings', access: ['lead'], body: UpdateShopRequest, response: Shop },
    async ({ auth, body }) =>
      ds.transaction(async (m) => {
        const shop = await m.findOne(ShopRow, { where: { id: auth.shopId }, lock: { mode: 'pessimistic_write' } });
        if (!shop) throw notFound('shop');
        Object.assign(shop, body);
        await m.save(shop);
        await recordAudit(m, { shopId: shop.id, actor: auth, action: 'shop.update', objectType: 'shop', objectId: shop.id, detail: body });
        return shopView(shop);
      }),
  );
}
