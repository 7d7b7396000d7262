import { useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { readShelfFilters, type ShelfFilters } from '../utils/shelf-queries';

export function useShelfFilters(): ShelfFilters {
  const [searchParams] = useSearchParams();
  return useMemo(() => readShelfFilters(searchParams), [searchParams]);
}
