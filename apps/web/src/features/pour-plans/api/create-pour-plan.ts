import type { PourPlanInput, PourPlanView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { keepPourPlan } from '../../../lib/resources/pour-plans';

export function createPourPlan(body: PourPlanInput): Promise<PourPlanView> {
  return callRoute('createPourPlan', { body });
}

export function useCreatePourPlan({ onSuccess }: { onSuccess?: (plan: PourPlanView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPourPlan,
    onSuccess: async (plan) => {
      await keepPourPlan(queryClient, plan);
      await onSuccess?.(plan);
    },
  });
}
