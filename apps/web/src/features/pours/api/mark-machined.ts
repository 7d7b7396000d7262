import { PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

export interface MachinedInput {
  machinedAt?: string;
  finishCoats: number;
  hoursBetweenCoats: number;
}

export function markMachined(pourId: string, input: MachinedInput): Promise<PourView> {
  return callRoute('markMachined', { params: { id: pourId }, body: input });
}

export function useMarkMachined(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MachinedInput) => markMachined(pourId, input),
    onSuccess: async (pour) => {
      queryClient.setQueryData(pourKeys.detail(pour.id), pour);
      await refreshPour(queryClient, pour.id);
    },
  });
}
