import { pourListKeys } from '../../../lib/resources/pours';
import type { CureBoardQuery } from '../utils/cure-board-filters';

export interface LotChoicesQuery {
  part: 'A' | 'B' | 'pigment';
  productId: string;
}

// Everything this feature caches lives under 'pours', so one invalidation after a change reaches the board,
// the pour pages and Today together.
export const pourKeys = {
  all: pourListKeys.all,
  lists: pourListKeys.lists,
  list: (query: CureBoardQuery) => [...pourKeys.lists(), query] as const,
  details: () => [...pourKeys.all, 'detail'] as const,
  detail: (pourId: string) => [...pourKeys.details(), pourId] as const,
  today: () => [...pourKeys.all, 'today'] as const,
  lotChoices: (query: LotChoicesQuery) => [...pourKeys.all, 'lot-choices', query] as const,
};
