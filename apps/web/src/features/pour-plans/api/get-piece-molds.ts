import { MoldList } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export type MoldPage = z.infer<typeof MoldList>;

/** The piece's moulds, to pour into one of them instead of a quick shape. */
export function getPieceMolds(pieceId: string, signal?: AbortSignal): Promise<MoldPage> {
  return api.get('/molds', MoldList, { query: { pieceId, limit: 200 }, ...(signal ? { signal } : {}) });
}

export const pieceMoldsQueryOptions = (pieceId: string) =>
  queryOptions({
    queryKey: pourPlanKeys.pieceMolds(pieceId),
    queryFn: ({ signal }) => getPieceMolds(pieceId, signal),
  });

export function usePieceMolds(pieceId: string) {
  return useQuery(pieceMoldsQueryOptions(pieceId));
}
