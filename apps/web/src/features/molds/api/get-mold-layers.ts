import { LayerVolumes as LayerVolumesSchema } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LayerVolumes } from '../types';
import { moldKeys, type LayersKey } from './keys';

/** The resin between consecutive heights above the cavity floor. */
export function getMoldLayers(moldId: string, key: LayersKey, signal?: AbortSignal): Promise<LayerVolumes> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/layers`, LayerVolumesSchema, {
    query: { levels: key.levelsMm.join(','), from: 'floor', dam: key.dam },
    ...(signal ? { signal } : {}),
  });
}

export const moldLayersQueryOptions = (moldId: string, key: LayersKey, analysedAt: string | null) =>
  queryOptions({
    queryKey: moldKeys.layers(moldId, key, analysedAt),
    queryFn: ({ signal }) => getMoldLayers(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  });

export function useMoldLayers(moldId: string, key: LayersKey | null, analysedAt: string | null) {
  return useQuery({
    ...moldLayersQueryOptions(moldId, key ?? { levelsMm: [], dam: 'outline' }, analysedAt),
    enabled: key !== null && key.levelsMm.length >= 2,
  });
}
