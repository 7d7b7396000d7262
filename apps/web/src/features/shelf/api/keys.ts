import { lotListKeys } from '../../../lib/resources/lots';
import type { PigmentListQuery, ResinSystemListQuery } from '../utils/shelf-queries';

// A list's key holds its whole query, sort column and direction included: each order is its own cache entry. Lots are
// not under the shelf's root: the mixing form reads them too, and a logged cup changes them (lib/resources/lots).

export const shelfKeys = {
  all: ['shelf'] as const,
  resinSystems: () => [...shelfKeys.all, 'resin-systems'] as const,
  resinSystemLists: () => [...shelfKeys.resinSystems(), 'list'] as const,
  resinSystemList: (query: ResinSystemListQuery) => [...shelfKeys.resinSystemLists(), query] as const,
  resinSystem: (resinSystemId: string) => [...shelfKeys.resinSystems(), 'detail', resinSystemId] as const,
  pigments: () => [...shelfKeys.all, 'pigments'] as const,
  pigmentLists: () => [...shelfKeys.pigments(), 'list'] as const,
  pigmentList: (query: PigmentListQuery) => [...shelfKeys.pigmentLists(), query] as const,
  pigment: (pigmentId: string) => [...shelfKeys.pigments(), 'detail', pigmentId] as const,
  lot: lotListKeys.detail,
  lotUses: lotListKeys.uses,
};
