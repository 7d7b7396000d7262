import { PourList } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourPlanKeys } from '../../../lib/resources/pour-plans';

/** The newest pour started from a plan, if any: its printed run sheet's codes then open that pour. */
export async function getLatestPourOfPlan(planId: string, signal?: AbortSignal): Promise<string | null> {
  const list = await callRoute('listPours', { query: { pourPlanId: planId, status: 'all', limit: 1 } }, signal ? { signal } : {});
  return list.items[0]?.id ?? null;
}

export const planPourQueryOptions = (planId: string) =>
  queryOptions({
    queryKey: [...pourPlanKeys.detail(planId), 'latest-pour'] as const,
    queryFn: ({ signal }) => getLatestPourOfPlan(planId, signal),
  });

export function usePlanPour(planId: string) {
  return useQuery(planPourQueryOptions(planId));
}
