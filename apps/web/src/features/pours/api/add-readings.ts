import { ReadingsAdded } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ReadingsAddedAnswer } from '../types';
import { refreshPour } from './refresh-pour';

export interface ReadingInput {
  at: string;
  tempC: number;
}

export function addReadings(pourId: string, readings: ReadingInput[], confirmUnusual = false): Promise<ReadingsAddedAnswer> {
  return api.post(`/pours/${encodeURIComponent(pourId)}/readings`, { readings, confirmUnusual }, ReadingsAdded);
}

export function useAddReading(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ reading, confirmUnusual }: { reading: ReadingInput; confirmUnusual: boolean }) => addReadings(pourId, [reading], confirmUnusual),
    onSuccess: () => refreshPour(queryClient, pourId),
  });
}
