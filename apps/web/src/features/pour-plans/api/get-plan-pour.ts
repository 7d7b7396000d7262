import { useQuery } from '@tanstack/react-query';
import { pourListQueryOptions } from '../../../lib/resources/pours';

/** The newest pour started from a plan, if any: its printed run sheet's codes then open that pour. */
export function usePlanPour(planId: string) {
  return useQuery({ ...pourListQueryOptions({ pourPlanId: planId, status: 'all', limit: 1 }), select: (page) => page.items[0]?.id ?? null });
}
