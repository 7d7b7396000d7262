import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-error';

export interface RequestMeta extends Record<string, unknown> {
  /** A 401 here is an answer (wrong password, signed out), not a session that ran out. */
  publicRequest?: boolean;
  /** False keeps an answer out of the copy the phone stores for offline reading. */
  persist?: boolean;
}

declare module '@tanstack/react-query' {
  interface Register {
    queryMeta: RequestMeta;
    mutationMeta: RequestMeta;
  }
}

const maxRetries = 2;
/**
 * Answers stay in memory as long as the offline copy keeps them (TanStack Query's persistence guide: gcTime at least
 * the persisted maxAge), or a page visited in the morning would be forgotten before the Wi-Fi drops in the afternoon.
 */
export const keptForOfflineMs = 24 * 60 * 60_000;

/**
 * Retry only what may succeed unchanged: an unreachable server or a 5xx (common practice). A 4xx says the request
 * itself was wrong (RFC 9110 §15.5), so repeating it would only repeat the answer.
 */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= maxRetries) return false;
  if (!isApiError(error)) return false;
  return error.status === 0 || error.status >= 500;
}

export function isSessionExpired(error: unknown, meta: RequestMeta | undefined): boolean {
  return isApiError(error) && error.status === 401 && meta?.publicRequest !== true;
}

export interface QueryClientHooks {
  onSessionExpired: () => void;
}

export function createQueryClient(hooks: QueryClientHooks): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isSessionExpired(error, query.meta)) hooks.onSessionExpired();
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _result, mutation) => {
        if (isSessionExpired(error, mutation.meta)) hooks.onSessionExpired();
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, gcTime: keptForOfflineMs, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}
