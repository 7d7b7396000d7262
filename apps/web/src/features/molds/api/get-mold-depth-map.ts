import { MoldDepthMap } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { moldKeys } from '../../../lib/resources/molds';

/**
 * The depth map of the report's fill to the top. The API tags it with an ETag and asks browsers to check before
 * reuse, so a page opened again gets a 304 rather than the map.
 */
export function getMoldDepthMap(moldId: string, signal?: AbortSignal): Promise<MoldDepthMap> {
  return callRoute('moldDepthMap', { params: { id: moldId } }, signal ? { signal } : {});
}

export const moldDepthMapQueryOptions = (moldId: string, analysedAt: string | null) =>
  queryOptions({
    queryKey: moldKeys.depthMap(moldId, analysedAt),
    queryFn: ({ signal }) => getMoldDepthMap(moldId, signal),
    staleTime: Infinity,
  });

export function useMoldDepthMap(moldId: string, analysedAt: string | null, enabled = true) {
  return useQuery({ ...moldDepthMapQueryOptions(moldId, analysedAt), enabled });
}
