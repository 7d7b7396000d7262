import { Piece } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pieceKeys } from './keys';

export function getPiece(pieceId: string, signal?: AbortSignal): Promise<Piece> {
  return callRoute('getPiece', { params: { id: pieceId } }, signal ? { signal } : {});
}

export const pieceQueryOptions = (pieceId: string) =>
  queryOptions({
    queryKey: pieceKeys.detail(pieceId),
    queryFn: ({ signal }) => getPiece(pieceId, signal),
  });

export function usePiece(pieceId: string) {
  return useQuery(pieceQueryOptions(pieceId));
}
