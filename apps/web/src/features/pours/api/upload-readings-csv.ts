import { ReadingsAdded } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadingsAddedAnswer } from '../types';
import { postRaw } from './raw-post';
import { refreshPour } from './refresh-pour';

/** The log goes as it is, `time,tempC` rows; the API either imports every row or names every bad one. */
export function uploadReadingsCsv(pourId: string, csvText: string): Promise<ReadingsAddedAnswer> {
  return postRaw(`/pours/${encodeURIComponent(pourId)}/readings/csv`, csvText, 'text/csv', ReadingsAdded);
}

export function useUploadReadingsCsv(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (csvText: string) => uploadReadingsCsv(pourId, csvText),
    onSuccess: () => refreshPour(queryClient, pourId),
  });
}
