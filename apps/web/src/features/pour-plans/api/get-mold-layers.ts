import { LayerVolumes } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export type MoldLayerVolumes = z.infer<typeof LayerVolumes>;

export interface MoldLayersRequest {
  moldId: string;
  /** Heights above the cavity floor, ascending. */
  levelsMm: readonly number[];
  dam: 'outline' | 'box';
}

/** The volume between consecutive levels with the chosen dam: the mould's curve as the plan needs it. */
export function getMoldLayers({ moldId, levelsMm, dam }: MoldLayersRequest, signal?: AbortSignal): Promise<MoldLayerVolumes> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/layers`, LayerVolumes, { query: { levels: levelsMm.join(','), from: 'floor', dam }, ...(signal ? { signal } : {}) });
}

export function useMoldLayers(request: MoldLayersRequest | null) {
  const levels = request?.levelsMm ?? [];
  return useQuery({
    ...queryOptions({
      queryKey: pourPlanKeys.moldLayers(request?.moldId ?? '', levels[0] ?? 0, levels[levels.length - 1] ?? 0, request?.dam ?? 'outline'),
      queryFn: ({ signal }) => getMoldLayers(request!, signal),
      staleTime: Number.POSITIVE_INFINITY,
    }),
    enabled: request !== null && levels.length >= 2,
  });
}
