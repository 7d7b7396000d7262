import { MeResponse } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { hasStatus } from '../../../lib/api-error';
import { authKeys } from '../../../lib/resources/session';

/** Who is signed in, in which shop, with which role; null when nobody is (the API answers 401). */
export async function getSession(signal?: AbortSignal): Promise<MeResponse | null> {
  try {
    return await callRoute('me', {}, signal ? { signal } : {});
  } catch (error) {
    if (hasStatus(error, 401)) return null;
    throw error;
  }
}

export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.session(),
    queryFn: ({ signal }) => getSession(signal),
    staleTime: 5 * 60_000,
    meta: { publicRequest: true },
  });

export function useSession() {
  return useQuery(sessionQueryOptions());
}
