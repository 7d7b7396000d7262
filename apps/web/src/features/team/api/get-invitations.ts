import { Invitation } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { teamKeys } from './keys';

const InvitationList = z.array(Invitation);

export function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  return api.get('/shop/invitations', InvitationList, signal ? { signal } : {});
}

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: teamKeys.invitationList(),
    queryFn: ({ signal }) => getInvitations(signal),
  });

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}
