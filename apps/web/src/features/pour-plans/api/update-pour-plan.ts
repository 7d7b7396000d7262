import { PourPlanView, type PourPlanInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { pourPlanKeys } from './keys';
import { api } from '../../../lib/api-client';

export interface UpdatePourPlanInput {
  planId: string;
  /** Every input again: the server recomputes the whole plan with the shelf as it is now. */
  values: PourPlanInput;
}

export function updatePourPlan({ planId, values }: UpdatePourPlanInput): Promise<PourPlanView> {
  return api.put(`/pour-plans/${encodeURIComponent(planId)}`, values, PourPlanView);
}

export function useUpdatePourPlan({ onSuccess }: { onSuccess?: (plan: PourPlanView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePourPlan,
    onSuccess: async (plan) => {
      queryClient.setQueryData(pourPlanKeys.detail(plan.id), plan);
      await queryClient.invalidateQueries({ queryKey: pourPlanKeys.lists() });
      await onSuccess?.(plan);
    },
  });
}
