import type { MeResponse } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { authKeys } from '../../auth/api/keys';
import { api } from '../../../lib/api-client';

const CalendarUrl = z.object({ calendarUrl: z.string() });

export function rotateCalendarUrl(): Promise<{ calendarUrl: string }> {
  return api.post('/me/calendar/rotate', {}, CalendarUrl);
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
