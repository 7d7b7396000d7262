import { useQuery } from '@tanstack/react-query';
import { piecePoursQueryOptions } from '../../../lib/resources/pours';

export function usePiecePours(pieceId: string) {
  return useQuery(piecePoursQueryOptions(pieceId));
}
