import { Piece } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pieceKeys } from './keys';

export function getPiece(pieceId: string, signal?: AbortSignal): Promise<Piece> {
  return api.get(`/pieces/${encodeURIComponent(pieceId)}`, Piece, signal ? { signal } : {});
}

export const pieceQueryOptions = (pieceId: string) =>
  queryOptions({
    queryKey: pieceKeys.detail(pieceId),
    queryFn: ({ signal }) => getPiece(pieceId, signal),
  });

export function usePiece(pieceId: string) {
  return useQuery(pieceQueryOptions(pieceId));
}
