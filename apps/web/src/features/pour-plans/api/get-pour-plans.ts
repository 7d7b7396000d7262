import { PourPlanList } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import type { PlanListQuery } from '../utils/plan-list-filters';
import { pourPlanKeys } from '../../../lib/resources/pour-plans';

export type PourPlanPage = z.infer<typeof PourPlanList>;

export function getPourPlans(query: PlanListQuery, signal?: AbortSignal): Promise<PourPlanPage> {
  return callRoute('listPourPlans', { query: { ...query } }, signal ? { signal } : {});
}

export const pourPlansQueryOptions = (query: PlanListQuery) =>
  queryOptions({
    queryKey: pourPlanKeys.list(query),
    queryFn: ({ signal }) => getPourPlans(query, signal),
    placeholderData: keepPreviousData,
  });

export function usePourPlans(query: PlanListQuery) {
  return useQuery(pourPlansQueryOptions(query));
}
