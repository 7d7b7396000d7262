import { pourPlanRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import type { PourPlans } from './pour-plans.service';

export function pourPlanRoutes(api: RouteRegistry, plans: PourPlans): void {
  api.implement(routes, {
    listPourPlans: ({ auth, query }) => plans.list(auth.shopId, query),
    createPourPlan: ({ auth, body }) => plans.create(auth, body),
    getPourPlan: ({ auth, params }) => plans.get(auth.shopId, params.id),
    replacePourPlan: ({ auth, params, body }) => plans.replace(auth, params.id, body),
    deletePourPlan: async ({ auth, params }) => {
      await plans.remove(auth, params.id);
      return undefined;
    },
  });
}
