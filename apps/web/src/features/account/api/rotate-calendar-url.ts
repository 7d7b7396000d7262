import type { MeResponse } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { authKeys } from '../../../lib/resources/session';
import { callRoute } from '../../../lib/api-routes';

export function rotateCalendarUrl(): Promise<{ calendarUrl: string }> {
  return callRoute('rotateCalendar', {});
}

/** A new private feed link; the old one stops answering at once, so the page shows the new one straight away. */
export function useRotateCalendarUrl() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: rotateCalendarUrl,
    onSuccess: async ({ calendarUrl }) => {
      queryClient.setQueryData<MeResponse | null>(authKeys.session(), (session) => (session ? { ...session, calendarUrl } : session));
      await queryClient.invalidateQueries({ queryKey: authKeys.session() });
    },
  });
}
