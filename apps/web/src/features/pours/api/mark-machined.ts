import { PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

export interface MachinedInput {
  machinedAt?: string;
  finishCoats: number;
  hoursBetweenCoats: number;
}

export function markMachined(pourId: string, input: MachinedInput): Promise<PourView> {
  return api.post(`/pours/${encodeURIComponent(pourId)}/machined`, input, PourView);
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
