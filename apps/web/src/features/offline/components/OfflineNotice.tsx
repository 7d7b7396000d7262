import { hashKey, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';
import { displayTimeZone } from '../../../lib/display-zone';
import { useOnline } from '../../../lib/offline/use-online';
import { shownAsOf } from '../utils/as-of';
import { clockTime } from '../utils/clock-time';

/**
 * With the network cut, says how old the page's data is ("offline — as of 14:32"), and that what is logged now is
 * kept on the phone; a page that was never opened before waits for the connection.
 */
export function OfflineNotice({
  pageLoading,
  notPageData,
}: {
  pageLoading: boolean;
  /** Who is signed in: on every page, not the page's data. */ notPageData: QueryKey;
}) {
  const ignored = hashKey(notPageData);
  const online = useOnline();
  const queryClient = useQueryClient();
  const cache = queryClient.getQueryCache();
  const asOf = useSyncExternalStore(
    (listener) => cache.subscribe(listener),
    () =>
      shownAsOf(
        cache
          .getAll()
          .filter((q) => q.queryHash !== ignored)
          .map((q) => ({ observed: q.getObserversCount() > 0, hasData: q.state.data !== undefined, dataUpdatedAt: q.state.dataUpdatedAt })),
      ),
  );
  if (online) return null;
  return (
    <div role="status" className="mb-4 flex flex-col gap-1 rounded-lg border border-walnut-400 bg-walnut-100 px-4 py-3 text-walnut-900">
      <p className="font-bold">{asOf === null ? 'offline' : `offline — as of ${clockTime(asOf, displayTimeZone())}`}</p>
      <p className="text-sm">
        {pageLoading
          ? 'This page was not opened on this phone before the connection dropped; it opens when the connection returns.'
          : 'What you log now is kept on this phone and sent when the connection returns.'}
      </p>
    </div>
  );
}
