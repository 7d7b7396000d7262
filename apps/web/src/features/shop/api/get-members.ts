import { Member } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { shopKeys } from './keys';

const MemberList = z.array(Member);

/** The shop's people, for choosing whose events the audit shows. */
export function getMembers(signal?: AbortSignal): Promise<Member[]> {
  return api.get('/shop/members', MemberList, signal ? { signal } : {});
}

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.members(),
    queryFn: ({ signal }) => getMembers(signal),
  });

export function useMembers() {
  return useQuery(membersQueryOptions());
}
