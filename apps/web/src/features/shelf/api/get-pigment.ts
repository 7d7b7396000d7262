import { PigmentView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export function getPigment(pigmentId: string, signal?: AbortSignal): Promise<PigmentView> {
  return api.get(`/shelf/pigments/${encodeURIComponent(pigmentId)}`, PigmentView, signal ? { signal } : {});
}

export const pigmentQueryOptions = (pigmentId: string) =>
  queryOptions({
    queryKey: shelfKeys.pigment(pigmentId),
    queryFn: ({ signal }) => getPigment(pigmentId, signal),
  });

export function usePigment(pigmentId: string) {
  return useQuery(pigmentQueryOptions(pigmentId));
}
