import type { PourPlanView, PourView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { getPourPlan } from '../../../lib/resources/pour-plans';
import { getPour } from './get-pour';
import { pourKeys } from './keys';

export interface PieceRecordPour {
  pour: PourView;
  plan: PourPlanView;
}

/** Pours of one piece, oldest first, each with its whole log and the plan it followed: everything a cure record prints. */
export async function getPieceRecord(pieceId: string, signal?: AbortSignal): Promise<PieceRecordPour[]> {
  const opts = signal ? { signal } : {};
  const list = await callRoute('listPours', { query: { pieceId, status: 'all', limit: 50, offset: 0 } }, opts);
  const oldestFirst = [...list.items].sort((p, q) => p.startedAt.localeCompare(q.startedAt));
  return Promise.all(
    oldestFirst.map(async (summary) => {
      const pour = await getPour(summary.id, signal);
      return { pour, plan: await getPourPlan(pour.pourPlanId, signal) };
    }),
  );
}

export const pieceRecordQueryOptions = (pieceId: string) =>
  queryOptions({
    // Under the feature's root key, so whatever refreshes a pour refreshes its record too.
    queryKey: [...pourKeys.all, 'record', pieceId] as const,
    queryFn: ({ signal }) => getPieceRecord(pieceId, signal),
  });

export function usePieceRecord(pieceId: string) {
  return useQuery(pieceRecordQueryOptions(pieceId));
}
