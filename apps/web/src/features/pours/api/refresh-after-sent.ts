import type { QueryClient } from '@tanstack/react-query';
import { refreshLots } from '../../../lib/resources/lots';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

/** After the phone sent what it kept offline: the pour's page, the board, Today, and the stock cups drew down. */
export async function refreshAfterSent(queryClient: QueryClient, pourId: string | null): Promise<void> {
  await Promise.all([pourId ? refreshPour(queryClient, pourId) : queryClient.invalidateQueries({ queryKey: pourKeys.all }), refreshLots(queryClient)]);
}
