import { InvitationPreview } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { authKeys } from '../../../lib/resources/session';

/** What an e-mailed invitation offers: the shop, the role and the address it was sent to. */
export function getInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return callRoute('previewInvitation', { params: { token } }, signal ? { signal } : {});
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    meta: { publicRequest: true },
    retry: false,
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
