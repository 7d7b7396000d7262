import type { PieceListQuery } from '../utils/piece-filters';

export const pieceKeys = {
  all: ['pieces'] as const,
  lists: () => [...pieceKeys.all, 'list'] as const,
  list: (query: PieceListQuery) => [...pieceKeys.lists(), query] as const,
  details: () => [...pieceKeys.all, 'detail'] as const,
  detail: (pieceId: string) => [...pieceKeys.details(), pieceId] as const,
};
