import { MoldView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

/** A mould with its cavity report: the volume-vs-level curve the plan splits into layers. */
export function getMold(moldId: string, signal?: AbortSignal): Promise<MoldView> {
  return api.get(`/molds/${encodeURIComponent(moldId)}`, MoldView, signal ? { signal } : {});
}

export const moldQueryOptions = (moldId: string) =>
  queryOptions({
    queryKey: pourPlanKeys.mold(moldId),
    queryFn: ({ signal }) => getMold(moldId, signal),
  });

export function useMold(moldId: string | null) {
  return useQuery({ ...moldQueryOptions(moldId ?? ''), enabled: moldId !== null });
}
