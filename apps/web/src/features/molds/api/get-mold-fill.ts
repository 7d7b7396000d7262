import type { MoldFill } from '@gelpoint/contracts';
import { useQuery } from '@tanstack/react-query';
import { moldFillQueryOptions, type FillKey } from '../../../lib/resources/molds';

/** The fill at one level; the numbers of the level before stay on screen while the next one is asked for. */
export function useMoldFill(moldId: string, key: FillKey, analysedAt: string | null, initialData?: MoldFill, enabled = true) {
  return useQuery({ ...moldFillQueryOptions(moldId, key, analysedAt), ...(initialData ? { initialData } : {}), enabled });
}
