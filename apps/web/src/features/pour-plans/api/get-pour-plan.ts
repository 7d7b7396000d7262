import { PourPlanView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export function getPourPlan(planId: string, signal?: AbortSignal): Promise<PourPlanView> {
  return api.get(`/pour-plans/${encodeURIComponent(planId)}`, PourPlanView, signal ? { signal } : {});
}

export const pourPlanQueryOptions = (planId: string) =>
  queryOptions({
    queryKey: pourPlanKeys.detail(planId),
    queryFn: ({ signal }) => getPourPlan(planId, signal),
  });

export function usePourPlan(planId: string) {
  return useQuery(pourPlanQueryOptions(planId));
}
