import { useQuery } from '@tanstack/react-query';
import { pourPlanQueryOptions } from '../../../lib/resources/pour-plans';

export function usePourPlan(planId: string) {
  return useQuery(pourPlanQueryOptions(planId));
}
