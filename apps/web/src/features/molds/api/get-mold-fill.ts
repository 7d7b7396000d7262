import { MoldFill } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { moldKeys, type FillKey } from './keys';

/** The fill with the resin surface at a height above the cavity floor; the answer also gives it in the mould's frame. */
export function getMoldFill(moldId: string, key: FillKey, signal?: AbortSignal): Promise<MoldFill> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/fill`, MoldFill, {
    query: { level: key.levelMm, from: 'floor', dam: key.dam, depthMap: key.depthMap },
    ...(signal ? { signal } : {}),
  });
}

/** The fill at one level; the numbers of the level before stay on screen while the next one is asked for. */
export const moldFillQueryOptions = (moldId: string, key: FillKey, analysedAt: string | null, initialData?: MoldFill) =>
  queryOptions({
    queryKey: moldKeys.fill(moldId, key, analysedAt),
    queryFn: ({ signal }) => getMoldFill(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    ...(initialData ? { initialData } : {}),
  });

export function useMoldFill(moldId: string, key: FillKey, analysedAt: string | null, initialData?: MoldFill, enabled = true) {
  return useQuery({ ...moldFillQueryOptions(moldId, key, analysedAt, initialData), enabled });
}
