import { z } from 'zod';
import { Id, PourPlanInput, PourPlanList, PourPlanListQuery, PourPlanView } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import type { PourPlans } from './pour-plans.service';

const IdParams = z.object({ id: Id });

export function pourPlanRoutes(api: RouteRegistry, plans: PourPlans): void {
  api.add({ method: 'get', path: '/pour-plans', tag: 'pour plans', summary: 'Pour plans of the shop, newest first', access: 'member', query: PourPlanListQuery, response: PourPlanList }, ({ auth, query }) =>
    plans.list(auth.shopId, query),
  );
  api.add(
    { method: 'post', path: '/pour-plans', tag: 'pour plans', summary: 'Plan a pour: seal coat, layers, batches, cost and cautions, computed on the server', access: ['lead', 'maker'], body: PourPlanInput, response: PourPlanView, status: 201, idempotent: true },
    ({ auth, body }) => plans.create(auth, body),
  );
  api.add({ method: 'get', path: '/pour-plans/:id', tag: 'pour plans', summary: 'One pour plan with its inputs, product snapshot and result', access: 'member', params: IdParams, response: PourPlanView }, ({ auth, params }) =>
    plans.get(auth.shopId, params.id),
  );
  api.add(
    { method: 'put', path: '/pour-plans/:id', tag: 'pour plans', summary: 'Replace a pour plan: recomputed with the shelf as it is now', access: ['lead', 'maker'], params: IdParams, body: PourPlanInput, response: PourPlanView },
    ({ auth, params, body }) => plans.replace(auth, params.id, body),
  );
  api.add({ method: 'delete', path: '/pour-plans/:id', tag: 'pour plans', summary: 'Delete a pour plan', access: ['lead', 'maker'], params: IdParams }, async ({ auth, params }) => {
    await plans.remove(auth, params.id);
    return undefined;
  });
}
