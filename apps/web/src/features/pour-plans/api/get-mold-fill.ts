import { CavityFill } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export interface MoldFillRequest {
  moldId: string;
  levelMm: number;
  dam: 'outline' | 'box';
}

/** What the mould holds and wets at one level, with its dam: the wetted area and deepest resin for the plan. */
export function getMoldFill({ moldId, levelMm, dam }: MoldFillRequest, signal?: AbortSignal): Promise<CavityFill> {
  return api.get(`/molds/${encodeURIComponent(moldId)}/fill`, CavityFill, { query: { level: levelMm, dam }, ...(signal ? { signal } : {}) });
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
