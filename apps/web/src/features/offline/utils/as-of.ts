/** What the offline notice needs of a cached query. */
export interface ShownQuery {
  observed: boolean;
  hasData: boolean;
  dataUpdatedAt: number;
}

/**
 * When the data on screen was fetched: the oldest of the answers the page is showing, since the page is only as
 * fresh as its stalest part. Null when the page shows nothing from the server.
 */
export function shownAsOf(queries: readonly ShownQuery[]): number | null {
  let oldest: number | null = null;
  for (const q of queries) {
    if (!q.observed || !q.hasData || q.dataUpdatedAt <= 0) continue;
    oldest = oldest === null ? q.dataUpdatedAt : Math.min(oldest, q.dataUpdatedAt);
  }
  return oldest;
}
