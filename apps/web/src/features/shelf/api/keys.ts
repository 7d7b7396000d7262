import type { PigmentListQuery, ResinSystemListQuery } from '../utils/shelf-queries';

// A list's key holds its whole query, sort column and direction included: each order is its own cache entry. The lists
// of lots are not here: the mixing form reads them too, under lotListKeys (lib/resources/lots).

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
  lots: () => [...shelfKeys.all, 'lots'] as const,
  lot: (lotId: string) => [...shelfKeys.lots(), 'detail', lotId] as const,
  lotUses: (lotId: string, page: number) => [...shelfKeys.lot(lotId), 'uses', page] as const,
};
