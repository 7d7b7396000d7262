import { MoldFill } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export interface MoldFillRequest {
  moldId: string;
  /** Height of the resin surface above the cavity floor, as the plan's fill level is. */
  levelMm: number;
  dam: 'outline' | 'box';
}

/** What the mould holds and wets at one level, with its dam: the wetted area, deepest resin and depth map (for the heat forecast) for the plan. */
export function getMoldFill({ moldId, levelMm, dam }: MoldFillRequest, signal?: AbortSignal): Promise<MoldFill> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/fill`, MoldFill, { query: { level: levelMm, from: 'floor', dam, depthMap: 'true' }, ...(signal ? { signal } : {}) });
}

export const moldFillQueryOptions = (request: MoldFillRequest) =>
  queryOptions({
    queryKey: pourPlanKeys.moldFill(request.moldId, request.levelMm, request.dam),
    queryFn: ({ signal }) => getMoldFill(request, signal),
    staleTime: Number.POSITIVE_INFINITY,
  });

export function useMoldFill(request: MoldFillRequest | null) {
  return useQuery({ ...moldFillQueryOptions(request ?? { moldId: '', levelMm: 0, dam: 'outline' }), enabled: request !== null });
}
