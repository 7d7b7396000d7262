import { ReadingsAdded, type PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { unexpectedResponse } from '../../../lib/api-error';
import { useOutbox } from '../../../lib/offline/outbox-context';
import type { ReadingsAddedAnswer } from '../types';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

export interface ReadingInput {
  at: string;
  tempC: number;
}

export type ReadingAnswer = { queued: false; added: ReadingsAddedAnswer } | { queued: true };

export const readingsPath = (pourId: string) => `/pours/${encodeURIComponent(pourId)}/readings`;

export function useAddReading(pourId: string) {
  const queryClient = useQueryClient();
  const outbox = useOutbox();
  return useMutation({
    // Runs with the network cut too: the outbox keeps the entry then, where a paused mutation would keep nothing.
    networkMode: 'always',
    mutationFn: async ({ reading, confirmUnusual }: { reading: ReadingInput; confirmUnusual: boolean }): Promise<ReadingAnswer> => {
      const pieceName = queryClient.getQueryData<PourView>(pourKeys.detail(pourId))?.piece.name;
      const label = `Reading of ${reading.tempC} °C${pieceName ? `, ${pieceName}` : ''}`;
      const done = await outbox.submit({
        kind: 'reading',
        pourId,
        label,
        request: { type: 'json', path: readingsPath(pourId), body: { readings: [reading], confirmUnusual } },
      });
      if (done.queued) return { queued: true };
      const parsed = ReadingsAdded.safeParse(done.answer);
      if (!parsed.success) throw unexpectedResponse(200);
      return { queued: false, added: parsed.data };
    },
    onSuccess: (answer) => (answer.queued ? undefined : refreshPour(queryClient, pourId)),
  });
}
