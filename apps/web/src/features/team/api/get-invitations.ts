import { Invitation } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { teamKeys } from './keys';

export function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  return callRoute('listInvitations', {}, signal ? { signal } : {});
}

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: teamKeys.invitationList(),
    queryFn: ({ signal }) => getInvitations(signal),
  });

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}
