import { PigmentView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export function getPigment(pigmentId: string, signal?: AbortSignal): Promise<PigmentView> {
  return callRoute('getPigment', { params: { id: pigmentId } }, signal ? { signal } : {});
}

export const pigmentQueryOptions = (pigmentId: string) =>
  queryOptions({
    queryKey: shelfKeys.pigment(pigmentId),
    queryFn: ({ signal }) => getPigment(pigmentId, signal),
  });

export function usePigment(pigmentId: string) {
  return useQuery(pigmentQueryOptions(pigmentId));
}
