import { Accepted, type PasswordResetRequest } from '@gelpoint/contracts';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';

export type ResetRequested = z.infer<typeof Accepted>;

/** The API answers the same whether or not the address has an account, so nobody can probe for members. */
export function requestPasswordReset(body: PasswordResetRequest): Promise<ResetRequested> {
  return callRoute('requestPasswordReset', { body });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset, meta: { publicRequest: true } });
}
