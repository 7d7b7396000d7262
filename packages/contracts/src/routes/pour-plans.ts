import { PourPlanInput, PourPlanList, PourPlanListQuery, PourPlanView } from '../pour-plans';
import { IdParams, route } from './route';

export const pourPlanRoutes = {
  listPourPlans: route({
    method: 'get',
    path: '/pour-plans',
    tag: 'pour plans',
    summary: 'Pour plans of the shop, newest first',
    access: 'member',
    query: PourPlanListQuery,
    response: PourPlanList,
  }),
  createPourPlan: route({
    method: 'post',
    path: '/pour-plans',
    tag: 'pour plans',
    summary: 'Plan a pour: seal coat, layers, batches, cost and cautions, computed on the server',
    access: 'plan:change',
    body: PourPlanInput,
    response: PourPlanView,
    status: 201,
    idempotent: true,
  }),
  getPourPlan: route({
    method: 'get',
    path: '/pour-plans/:id',
    tag: 'pour plans',
    summary: 'One pour plan with its inputs, product snapshot and result',
    access: 'member',
    params: IdParams,
    response: PourPlanView,
  }),
  replacePourPlan: route({
    method: 'put',
    path: '/pour-plans/:id',
    tag: 'pour plans',
    summary: 'Replace a pour plan: recomputed with the shelf as it is now',
    access: 'plan:change',
    params: IdParams,
    body: PourPlanInput,
    response: PourPlanView,
  }),
  deletePourPlan: route({
    method: 'delete',
    path: '/pour-plans/:id',
    tag: 'pour plans',
    summary: 'Delete a pour plan',
    access: 'plan:change',
    params: IdParams,
  }),
};
