import { ReadingsAdded } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ReadingsAddedAnswer } from '../types';
import { refreshPour } from './refresh-pour';

/** The log goes as it is, `time,tempC` rows; the API either imports every row or names every bad one. */
export function uploadReadingsCsv(pourId: string, csvText: string, confirmUnusual = false): Promise<ReadingsAddedAnswer> {
  return api.postBody(`/pours/${encodeURIComponent(pourId)}/readings/csv`, csvText, 'text/csv', ReadingsAdded, {
    query: { confirmUnusual: String(confirmUnusual) },
  });
}

export function useUploadReadingsCsv(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ csvText, confirmUnusual }: { csvText: string; confirmUnusual: boolean }) => uploadReadingsCsv(pourId, csvText, confirmUnusual),
    onSuccess: () => refreshPour(queryClient, pourId),
  });
}
