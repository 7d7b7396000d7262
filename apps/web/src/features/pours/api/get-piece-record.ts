import type { PourPlanView, PourSummary, PourView } from '@gelpoint/contracts';
import { useQueries, useQuery, type QueryClient } from '@tanstack/react-query';
import { pourPlanQueryOptions } from '../../../lib/resources/pour-plans';
import { piecePoursQueryOptions, pourQueryOptions } from '../../../lib/resources/pours';

export interface PieceRecordPour {
  pour: PourView;
  plan: PourPlanView;
}

// A cure record is no resource of its own: it is told from the piece's pours, each pour with its log and the plan it
// followed, each read under the key every other page reads it by, so whatever refreshes a pour refreshes its record.

const oldestFirst = (pours: PourSummary[]) => [...pours].sort((p, q) => p.startedAt.localeCompare(q.startedAt));

/** For the record page's loader: the piece's pours, their logs and their plans, in the cache before the page draws. */
export async function ensurePieceRecord(queryClient: QueryClient, pieceId: string): Promise<void> {
  const page = await queryClient.ensureQueryData(piecePoursQueryOptions(pieceId));
  await Promise.all(
    page.items.map(async (summary) => {
      const pour = await queryClient.ensureQueryData(pourQueryOptions(summary.id));
      await queryClient.ensureQueryData(pourPlanQueryOptions(pour.pourPlanId));
    }),
  );
}

/** Pours of one piece, oldest first, each with its whole log and the plan it followed: everything a cure record prints. */
export function usePieceRecord(pieceId: string): { data: PieceRecordPour[] | undefined; error: Error | null } {
  const list = useQuery(piecePoursQueryOptions(pieceId));
  const pours = useQueries({ queries: oldestFirst(list.data?.items ?? []).map((summary) => pourQueryOptions(summary.id)) });
  const plans = useQueries({
    queries: pours.map((pour) => ({ ...pourPlanQueryOptions(pour.data?.pourPlanId ?? ''), enabled: pour.data !== undefined })),
  });
  const error = list.error ?? pours.find((q) => q.error)?.error ?? plans.find((q) => q.error)?.error ?? null;
  if (!list.data) return { data: undefined, error };
  const record: PieceRecordPour[] = [];
  for (const [i, pour] of pours.entries()) {
    const plan = plans[i]?.data;
    if (!pour.data || !plan) return { data: undefined, error };
    record.push({ pour: pour.data, plan });
  }
  return { data: record, error };
}
