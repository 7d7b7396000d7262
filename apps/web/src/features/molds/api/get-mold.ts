import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { moldQueryOptions } from '../../../lib/resources/molds';
import { useMoldProgress } from '../hooks/use-mold-progress';
import { moldPollInterval } from '../utils/mold-progress';

/** The mould, moved on by its analysis stream while it is measured (a slow poll only if the stream fails). */
export function useMold(moldId: string) {
  const [streamFailed, setStreamFailed] = useState(false);
  const query = useQuery({ ...moldQueryOptions(moldId), refetchInterval: (q) => moldPollInterval(q.state.data?.status, streamFailed) });
  useMoldProgress(moldId, query.data?.status, setStreamFailed);
  return query;
}
