import type { QueryClient } from '@tanstack/react-query';
import { pourKeys } from './keys';

/** After anything logged against a pour: its page, the board and Today all move (stages, reminders, stock). */
export async function refreshPour(queryClient: QueryClient, pourId: string): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: pourKeys.detail(pourId) }),
    queryClient.invalidateQueries({ queryKey: pourKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: pourKeys.today() }),
  ]);
}
