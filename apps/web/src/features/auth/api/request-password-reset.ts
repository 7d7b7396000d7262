import { Accepted, type PasswordResetRequest } from '@gelpoint/contracts';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';

export type ResetRequested = z.infer<typeof Accepted>;

/** The API answers the same whether or not the address has an account, so nobody can probe for members. */
export function requestPasswordReset(body: PasswordResetRequest): Promise<ResetRequested> {
  return api.post('/auth/password-reset', body, Accepted);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset, meta: { publicRequest: true } });
}
