import { ReminderView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourKeys } from './keys';

export function markReminderDone(reminderId: string): Promise<ReminderView> {
  return api.post(`/reminders/${encodeURIComponent(reminderId)}/done`, {}, ReminderView);
}

/** Any member marks a reminder done: it leaves Today, the board and the pour's list of what is due. */
export function useMarkReminderDone() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markReminderDone,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: pourKeys.today() }),
        queryClient.invalidateQueries({ queryKey: pourKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: pourKeys.details() }),
      ]),
  });
}
