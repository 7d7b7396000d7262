import { LayerVolumes as LayerVolumesSchema } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LayerVolumes } from '../types';
import { moldKeys, type LayersKey } from './keys';

export function getMoldLayers(moldId: string, key: LayersKey, signal?: AbortSignal): Promise<LayerVolumes> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/layers`, LayerVolumesSchema, {
    query: { levels: key.levelsMm.join(','), dam: key.dam },
    ...(signal ? { signal } : {}),
  });
}

export const moldLayersQueryOptions = (moldId: string, key: LayersKey) =>
  queryOptions({
    queryKey: moldKeys.layers(moldId, key),
    queryFn: ({ signal }) => getMoldLayers(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  });

export function useMoldLayers(moldId: string, key: LayersKey | null) {
  return useQuery({
    ...moldLayersQueryOptions(moldId, key ?? { levelsMm: [], dam: 'outline' }),
    enabled: key !== null && key.levelsMm.length >= 2,
  });
}
