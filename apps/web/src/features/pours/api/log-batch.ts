import { BatchView, Warning, type LogBatchRequest, type PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { unexpectedResponse } from '../../../lib/api-error';
import { useOutbox } from '../../../lib/offline/outbox-context';
import { refreshLots } from '../../../lib/resources/lots';
import { refreshPour } from './refresh-pour';
import { pourKeys } from './keys';

const BatchLogged = z.object({ batch: BatchView, warnings: z.array(Warning) });
export type BatchLogged = z.infer<typeof BatchLogged>;

/** Logged now (with the server's answer), or kept on the phone until the connection returns. */
export type BatchLogAnswer = { queued: false; logged: BatchLogged } | { queued: true };

export const batchPath = (pourId: string) => `/pours/${encodeURIComponent(pourId)}/batches`;

/** "Cup 2 (layer 1), Walnut tray": what the list of unsent entries calls a cup. */
export function cupLabel(cup: { order: number; pourLabel: string }, pieceName: string | undefined): string {
  return `Cup ${cup.order} (${cup.pourLabel.toLowerCase()})${pieceName ? `, ${pieceName}` : ''}`;
}

export function useLogBatch(pourId: string, cup: { order: number; pourLabel: string }) {
  const queryClient = useQueryClient();
  const outbox = useOutbox();
  return useMutation({
    // Runs with the network cut too: the outbox keeps the entry then, where a paused mutation would keep nothing.
    networkMode: 'always',
    mutationFn: async (batch: LogBatchRequest): Promise<BatchLogAnswer> => {
      const pieceName = queryClient.getQueryData<PourView>(pourKeys.detail(pourId))?.piece.name;
      const done = await outbox.submit({
        kind: 'batch',
        pourId,
        label: cupLabel(cup, pieceName),
        request: { type: 'json', path: batchPath(pourId), body: batch },
      });
      if (done.queued) return { queued: true };
      const parsed = BatchLogged.safeParse(done.answer);
      if (!parsed.success) throw unexpectedResponse(201);
      return { queued: false, logged: parsed.data };
    },
    onSuccess: async (answer) => {
      if (answer.queued) return;
      await refreshPour(queryClient, pourId);
      // Logged cups draw stock down; the lot pickers and the shelf should show what is left.
      await refreshLots(queryClient);
    },
  });
}
