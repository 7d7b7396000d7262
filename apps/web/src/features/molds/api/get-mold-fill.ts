import { CavityFill } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { moldKeys, type FillKey } from './keys';

export function getMoldFill(moldId: string, key: FillKey, signal?: AbortSignal): Promise<CavityFill> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/fill`, CavityFill, {
    query: { level: key.levelMm, dam: key.dam, depthMap: key.depthMap },
    ...(signal ? { signal } : {}),
  });
}

/** The fill at one level; the numbers of the level before stay on screen while the next one is asked for. */
export const moldFillQueryOptions = (moldId: string, key: FillKey, initialData?: CavityFill) =>
  queryOptions({
    queryKey: moldKeys.fill(moldId, key),
    queryFn: ({ signal }) => getMoldFill(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    ...(initialData ? { initialData } : {}),
  });

export function useMoldFill(moldId: string, key: FillKey, initialData?: CavityFill) {
  return useQuery(moldFillQueryOptions(moldId, key, initialData));
}
