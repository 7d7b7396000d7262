import { BatchView, ReadingView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';
import { refreshPour } from './refresh-pour';

export function voidReading(pourId: string, readingId: string, reason: string): Promise<ReadingView> {
  return callRoute('voidReading', { params: { id: pourId, readingId }, body: { reason } });
}

export function voidBatch(pourId: string, batchId: string, reason: string): Promise<BatchView> {
  return callRoute('voidBatch', { params: { id: pourId, batchId }, body: { reason } });
}

/** Voids a reading or a cup with its reason; the pour, the board and Today follow, and a voided cup's stock goes back to its lots. */
export function useVoidEntry(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ kind, id, reason }: { kind: 'reading' | 'batch'; id: string; reason: string }): Promise<void> => {
      if (kind === 'reading') await voidReading(pourId, id, reason);
      else await voidBatch(pourId, id, reason);
    },
    onSuccess: async (_answer, { kind }) => {
      await Promise.all([refreshPour(queryClient, pourId), kind === 'batch' ? refreshLots(queryClient) : undefined]);
    },
  });
}
