import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useOutbox } from '../../../lib/offline/outbox-context';
import { pourKeys } from './keys';

/** Any member marks a reminder done: it leaves Today, the board and the pour's list of what is due. */
export function useMarkReminderDone() {
  const queryClient = useQueryClient();
  const outbox = useOutbox();
  return useMutation({
    // Runs with the network cut too: the outbox keeps the entry then, where a paused mutation would keep nothing.
    networkMode: 'always',
    mutationFn: async ({ reminderId, title, pourId }: { reminderId: string; title: string; pourId: string | null }): Promise<{ queued: boolean }> => {
      const done = await outbox.submit({
        kind: 'reminder-done',
        pourId,
        label: `Done: ${title}`,
        request: { type: 'json', path: `/reminders/${encodeURIComponent(reminderId)}/done`, body: {} },
      });
      return { queued: done.queued };
    },
    onSuccess: (answer) =>
      answer.queued
        ? undefined
        : Promise.all([
            queryClient.invalidateQueries({ queryKey: pourKeys.today() }),
            queryClient.invalidateQueries({ queryKey: pourKeys.lists() }),
            queryClient.invalidateQueries({ queryKey: pourKeys.details() }),
          ]),
  });
}
