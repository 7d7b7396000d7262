import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { hasStatus } from '../../../lib/api-error';

/** Ends the session; a 401 means it had already ended, which is what was wanted. */
export async function signOut(): Promise<void> {
  try {
    await api.postWithoutContent('/auth/logout');
  } catch (error) {
    if (hasStatus(error, 401)) return;
    throw error;
  }
}

/** The caller moves to the sign-in page and then clears the cache, so no signed-in page renders without data. */
export function useSignOut({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  return useMutation({
    mutationFn: signOut,
    meta: { publicRequest: true },
    onSuccess: async () => {
      await onSuccess?.();
    },
  });
}
