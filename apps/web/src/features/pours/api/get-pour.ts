import { useQuery } from '@tanstack/react-query';
import { pourQueryOptions } from '../../../lib/resources/pours';

export function usePour(pourId: string) {
  return useQuery(pourQueryOptions(pourId));
}
