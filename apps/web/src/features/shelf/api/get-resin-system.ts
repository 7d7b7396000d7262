import { ResinSystemView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export function getResinSystem(resinSystemId: string, signal?: AbortSignal): Promise<ResinSystemView> {
  return callRoute('getResinSystem', { params: { id: resinSystemId } }, signal ? { signal } : {});
}

export const resinSystemQueryOptions = (resinSystemId: string) =>
  queryOptions({
    queryKey: shelfKeys.resinSystem(resinSystemId),
    queryFn: ({ signal }) => getResinSystem(resinSystemId, signal),
  });

export function useResinSystem(resinSystemId: string) {
  return useQuery(resinSystemQueryOptions(resinSystemId));
}
