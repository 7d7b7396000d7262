import { useQuery } from '@tanstack/react-query';
import { moldLayersQueryOptions, moldQueryOptions } from '../../../lib/resources/molds';

export interface MoldLayersRequest {
  moldId: string;
  /** Heights above the cavity floor, ascending. */
  levelsMm: readonly number[];
  dam: 'outline' | 'box';
}

/** The volume between consecutive levels with the chosen dam: the mould's curve as the plan needs it. */
export function useMoldLayers(request: MoldLayersRequest | null) {
  const mold = useQuery({ ...moldQueryOptions(request?.moldId ?? ''), enabled: request !== null });
  const key = { levelsMm: request?.levelsMm ?? [], dam: request?.dam ?? 'outline' };
  return useQuery({
    ...moldLayersQueryOptions(request?.moldId ?? '', key, mold.data?.analysedAt ?? null),
    enabled: request !== null && key.levelsMm.length >= 2 && mold.data !== undefined,
  });
}
