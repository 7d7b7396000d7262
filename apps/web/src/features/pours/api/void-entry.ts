import { BatchView, ReadingView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshPour } from './refresh-pour';

export function voidReading(pourId: string, readingId: string, reason: string): Promise<ReadingView> {
  return api.deleteWith(`/pours/${encodeURIComponent(pourId)}/readings/${encodeURIComponent(readingId)}`, { reason }, ReadingView);
}

export function voidBatch(pourId: string, batchId: string, reason: string): Promise<BatchView> {
  return api.post(`/pours/${encodeURIComponent(pourId)}/batches/${encodeURIComponent(batchId)}/void`, { reason }, BatchView);
}

/** Voids a reading or a cup with its reason; the pour, the board and Today follow. */
export function useVoidEntry(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ kind, id, reason }: { kind: 'reading' | 'batch'; id: string; reason: string }): Promise<void> => {
      if (kind === 'reading') await voidReading(pourId, id, reason);
      else await voidBatch(pourId, id, reason);
    },
    onSuccess: () => refreshPour(queryClient, pourId),
  });
}
