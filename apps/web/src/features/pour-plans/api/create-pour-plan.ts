import { PourPlanView, type PourPlanInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export function createPourPlan(body: PourPlanInput): Promise<PourPlanView> {
  return api.post('/pour-plans', body, PourPlanView);
}

export function useCreatePourPlan({ onSuccess }: { onSuccess?: (plan: PourPlanView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPourPlan,
    onSuccess: async (plan) => {
      queryClient.setQueryData(pourPlanKeys.detail(plan.id), plan);
      await queryClient.invalidateQueries({ queryKey: pourPlanKeys.lists() });
      await onSuccess?.(plan);
    },
  });
}
