import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { env } from '../../../config/env';
import { buildUrl } from '../../../lib/api-client';
import { moldKeys } from '../../../lib/resources/molds';
import type { MoldStatus, MoldView } from '../types';
import { progressEventTypes, readProgressEvent, withProgress } from '../utils/mold-progress';
import { isAnalysing } from '../utils/mold-status';

/**
 * Follows a mould's analysis through the API's event stream while it runs, moving the cached mould on with each
 * event and reading it once more when the report is ready. The stream is a same-site GET, so the session cookie
 * goes with it as with any read. `onStreamFailed` hears whether the stream could not be had (a browser without
 * EventSource, or a stream refused), so the page can fall back to asking now and then.
 */
export function useMoldProgress(moldId: string, status: MoldStatus | undefined, onStreamFailed: (failed: boolean) => void): void {
  const queryClient = useQueryClient();
  const running = status !== undefined && isAnalysing(status);

  useEffect(() => {
    if (!running) return;
    if (typeof EventSource === 'undefined') return onStreamFailed(true);
    onStreamFailed(false);
    const key = moldKeys.detail(moldId);
    const source = new EventSource(buildUrl(env.apiBasePath, `/molds/${encodeURIComponent(moldId)}/events`));
    for (const type of progressEventTypes) {
      source.addEventListener(type, (e) => {
        const read = readProgressEvent(type, e.data);
        if (!read) return;
        queryClient.setQueryData<MoldView>(key, (old) => (old ? withProgress(old, read.event) : old));
        if (read.last) {
          source.close();
          void queryClient.invalidateQueries({ queryKey: key, exact: true });
        }
      });
    }
    // A dropped stream is reconnected by the browser itself; one it gave up on (refused, say) is not.
    source.addEventListener('error', () => {
      if (source.readyState === EventSource.CLOSED) onStreamFailed(true);
    });
    return () => source.close();
  }, [moldId, running, queryClient, onStreamFailed]);
}
