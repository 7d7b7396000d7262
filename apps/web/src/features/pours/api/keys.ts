import { pourResourceKeys } from '../../../lib/resources/pours';
import type { CureBoardQuery } from '../utils/cure-board-filters';

// The lot pickers' lists are lotListKeys' (lib/resources/lots), shared with the shelf.
export interface LotChoicesQuery {
  part: 'A' | 'B' | 'pigment';
  productId: string;
}

// Every pour this feature caches lives under 'pours', so one invalidation after a change reaches the board,
// the pour pages, the cure records and Today together.
export const pourKeys = {
  all: pourResourceKeys.all,
  lists: pourResourceKeys.lists,
  list: (query: CureBoardQuery) => [...pourKeys.lists(), query] as const,
  details: pourResourceKeys.details,
  detail: pourResourceKeys.detail,
  today: () => [...pourKeys.all, 'today'] as const,
};
