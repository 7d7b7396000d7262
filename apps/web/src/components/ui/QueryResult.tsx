import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ErrorAlert } from './ErrorAlert';
import { PageSpinner } from './PageSpinner';

export interface QueryResultProps<T> {
  query: UseQueryResult<T>;
  loadingLabel?: string;
  children: (data: T) => ReactNode;
}

/** Data the route loader usually already fetched; a spinner or the error only when it did not. */
export function QueryResult<T>({ query, loadingLabel, children }: QueryResultProps<T>) {
  if (query.data !== undefined) return <>{children(query.data)}</>;
  if (query.isError) return <ErrorAlert error={query.error} />;
  return <PageSpinner {...(loadingLabel ? { label: loadingLabel } : {})} />;
}
