import { queryOptions, useQuery } from '@tanstack/react-query';
import { env } from '../../../config/env';
import { buildUrl } from '../../../lib/api-client';
import { errorFromResponse, networkError } from '../../../lib/api-error';
import { moldKeys } from '../../../lib/resources/molds';

/** The mould file (STL, 3MF or OBJ) as uploaded, for the 3D view; bytes, not JSON, so it goes around the JSON client. */
export async function getMoldStl(moldId: string, signal?: AbortSignal): Promise<ArrayBuffer> {
  let response: Response;
  try {
    response = await fetch(buildUrl(env.apiBasePath, `/molds/${encodeURIComponent(moldId)}/stl`), {
      headers: { Accept: 'application/octet-stream' },
      credentials: 'same-origin',
      ...(signal ? { signal } : {}),
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw networkError();
  }
  if (!response.ok) throw errorFromResponse(response.status, await response.text());
  return response.arrayBuffer();
}

export const moldStlQueryOptions = (moldId: string) =>
  queryOptions({
    queryKey: moldKeys.stl(moldId),
    queryFn: ({ signal }) => getMoldStl(moldId, signal),
    // The file of a mould never changes; keep it for the visit.
    staleTime: Infinity,
  });

export function useMoldStl(moldId: string) {
  return useQuery(moldStlQueryOptions(moldId));
}
