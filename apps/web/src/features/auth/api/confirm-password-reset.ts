import type { PasswordResetConfirm } from '@gelpoint/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function confirmPasswordReset(body: PasswordResetConfirm): Promise<void> {
  return api.postWithoutContent('/auth/password-reset/confirm', body);
}

export function useConfirmPasswordReset({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  return useMutation({
    mutationFn: confirmPasswordReset,
    meta: { publicRequest: true },
    onSuccess: async () => {
      await onSuccess?.();
    },
  });
}
