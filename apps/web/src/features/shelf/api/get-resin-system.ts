import { ResinSystemView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export function getResinSystem(resinSystemId: string, signal?: AbortSignal): Promise<ResinSystemView> {
  return api.get(`/shelf/resin-systems/${encodeURIComponent(resinSystemId)}`, ResinSystemView, signal ? { signal } : {});
}

export const resinSystemQueryOptions = (resinSystemId: string) =>
  queryOptions({
    queryKey: shelfKeys.resinSystem(resinSystemId),
    queryFn: ({ signal }) => getResinSystem(resinSystemId, signal),
  });

export function useResinSystem(resinSystemId: string) {
  return useQuery(resinSystemQueryOptions(resinSystemId));
}
