import { useQuery } from '@tanstack/react-query';
import { moldFillQueryOptions, moldQueryOptions } from '../../../lib/resources/molds';

export interface MoldFillRequest {
  moldId: string;
  /** Height of the resin surface above the cavity floor, as the plan's fill level is. */
  levelMm: number;
  dam: 'outline' | 'box';
}

/** What the mould holds and wets at one level, with its dam: the wetted area, deepest resin and depth map (for the heat forecast) for the plan. */
export function useMoldFill(request: MoldFillRequest | null) {
  const mold = useQuery({ ...moldQueryOptions(request?.moldId ?? ''), enabled: request !== null });
  const key = { levelMm: request?.levelMm ?? 0, dam: request?.dam ?? 'outline', depthMap: true };
  return useQuery({ ...moldFillQueryOptions(request?.moldId ?? '', key, mold.data?.analysedAt ?? null), enabled: request !== null && mold.data !== undefined });
}
