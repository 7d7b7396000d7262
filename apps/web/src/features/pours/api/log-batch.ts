import { BatchView, Warning, type LogBatchRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { refreshPour } from './refresh-pour';
import { pourKeys } from './keys';

const BatchLogged = z.object({ batch: BatchView, warnings: z.array(Warning) });
export type BatchLogged = z.infer<typeof BatchLogged>;

export interface LogBatchInput {
  pourId: string;
  batch: LogBatchRequest;
}

export function logBatch({ pourId, batch }: LogBatchInput): Promise<BatchLogged> {
  return api.post(`/pours/${encodeURIComponent(pourId)}/batches`, batch, BatchLogged);
}

export function useLogBatch(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (batch: LogBatchRequest) => logBatch({ pourId, batch }),
    onSuccess: async () => {
      await refreshPour(queryClient, pourId);
      // Logged cups draw stock down; the lot pickers should show what is left.
      await queryClient.invalidateQueries({ queryKey: [...pourKeys.all, 'lot-choices'] });
    },
  });
}
