import { Shop, UpdateShopRequest } from '../shop';
import { route } from './route';

export const shopRoutes = {
  getShop: route({ method: 'get', path: '/shop', tag: 'shop', summary: 'The current shop and its settings', access: 'member', response: Shop }),
  updateShop: route({
    method: 'patch',
    path: '/shop',
    tag: 'shop',
    summary: 'Change the shop name, units, scale resolution, currency or cure-log settings',
    access: 'shop:manage',
    body: UpdateShopRequest,
    response: Shop,
  }),
};
