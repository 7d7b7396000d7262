import { MoldView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { api } from '../../../lib/api-client';
import { useMoldProgress } from '../hooks/use-mold-progress';
import { moldPollInterval } from '../utils/mold-progress';
import { moldKeys } from './keys';

export function getMold(moldId: string, signal?: AbortSignal): Promise<MoldView> {
  return api.get(`/molds/${encodeURIComponent(moldId)}`, MoldView, signal ? { signal } : {});
}

export const moldQueryOptions = (moldId: string) =>
  queryOptions({
    queryKey: moldKeys.detail(moldId),
    queryFn: ({ signal }) => getMold(moldId, signal),
  });

/** The mould, moved on by its analysis stream while it is measured (a slow poll only if the stream fails). */
export function useMold(moldId: string) {
  const [streamFailed, setStreamFailed] = useState(false);
  const query = useQuery({ ...moldQueryOptions(moldId), refetchInterval: (q) => moldPollInterval(q.state.data?.status, streamFailed) });
  useMoldProgress(moldId, query.data?.status, setStreamFailed);
  return query;
}
