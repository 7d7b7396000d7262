import { PourPlanView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourKeys } from './keys';

/** The plan a pour follows: its run sheet (targets per cup) and the products it was planned with. */
export function getPlan(planId: string, signal?: AbortSignal): Promise<PourPlanView> {
  return api.get(`/pour-plans/${encodeURIComponent(planId)}`, PourPlanView, signal ? { signal } : {});
}

export const planQueryOptions = (planId: string) =>
  queryOptions({
    queryKey: pourKeys.plan(planId),
    queryFn: ({ signal }) => getPlan(planId, signal),
  });

export function usePlan(planId: string | undefined) {
  return useQuery({ ...planQueryOptions(planId ?? ''), enabled: planId !== undefined });
}
