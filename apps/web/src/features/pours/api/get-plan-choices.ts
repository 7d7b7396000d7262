import { PourPlanList } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import { pourPlanKeys } from '../../../lib/resources/pour-plans';

export type PlanChoices = z.infer<typeof PourPlanList>;

/** The most plans one page offers to start a pour from (the API's largest page). */
export const planChoicesLimit = 200;

export function getPlanChoices(signal?: AbortSignal): Promise<PlanChoices> {
  return callRoute('listPourPlans', { query: { limit: planChoicesLimit } }, signal ? { signal } : {});
}

export const planChoicesQueryOptions = () =>
  queryOptions({
    // A page of the plans' own list: a plan saved or deleted anywhere refreshes the choices.
    queryKey: pourPlanKeys.list({ limit: planChoicesLimit }),
    queryFn: ({ signal }) => getPlanChoices(signal),
  });

export function usePlanChoices() {
  return useQuery(planChoicesQueryOptions());
}
