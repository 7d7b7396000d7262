import { useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { readPieceFilters, type PieceFilters } from '../utils/piece-filters';

export function usePieceFilters(): PieceFilters {
  const [searchParams] = useSearchParams();
  return useMemo(() => readPieceFilters(searchParams), [searchParams]);
}
