import type { PourPlanView } from '@gelpoint/contracts';
import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

// One cache entry per pour plan, read by the planner, the plan pages and a pour's run sheet alike: an edit written
// here is what every one of them shows next.
export const pourPlanKeys = {
  all: ['pour-plans'] as const,
  lists: () => [...pourPlanKeys.all, 'list'] as const,
  list: (query: object) => [...pourPlanKeys.lists(), query] as const,
  details: () => [...pourPlanKeys.all, 'detail'] as const,
  detail: (planId: string) => [...pourPlanKeys.details(), planId] as const,
};

export const getPourPlan = (planId: string, signal?: AbortSignal) => callRoute('getPourPlan', { params: { id: planId } }, signal ? { signal } : {});

export const pourPlanQueryOptions = (planId: string) =>
  queryOptions({
    queryKey: pourPlanKeys.detail(planId),
    queryFn: ({ signal }) => getPourPlan(planId, signal),
  });

/** After a save: the plan as the server worked it out is what every view of it shows, and the lists are asked again. */
export async function keepPourPlan(queryClient: QueryClient, plan: PourPlanView): Promise<void> {
  queryClient.setQueryData(pourPlanKeys.detail(plan.id), plan);
  await queryClient.invalidateQueries({ queryKey: pourPlanKeys.lists() });
}

/** After a deletion: the plan's entries go and the lists are asked again. */
export async function forgetPourPlan(queryClient: QueryClient, planId: string): Promise<void> {
  queryClient.removeQueries({ queryKey: pourPlanKeys.detail(planId) });
  await queryClient.invalidateQueries({ queryKey: pourPlanKeys.lists() });
}
