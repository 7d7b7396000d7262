import type { PourPlanInput, PourPlanView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { keepPourPlan } from '../../../lib/resources/pour-plans';

export interface UpdatePourPlanInput {
  planId: string;
  /** Every input again: the server recomputes the whole plan with the shelf as it is now. */
  values: PourPlanInput;
}

export function updatePourPlan({ planId, values }: UpdatePourPlanInput): Promise<PourPlanView> {
  return callRoute('replacePourPlan', { params: { id: planId }, body: values });
}

export function useUpdatePourPlan({ onSuccess }: { onSuccess?: (plan: PourPlanView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePourPlan,
    onSuccess: async (plan) => {
      await keepPourPlan(queryClient, plan);
      await onSuccess?.(plan);
    },
  });
}
