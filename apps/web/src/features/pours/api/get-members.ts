import { Member } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { pourKeys } from './keys';

const MemberList = z.array(Member);

/** Who can be told about a pour's reminders. */
export function getMembers(signal?: AbortSignal): Promise<Member[]> {
  return api.get('/shop/members', MemberList, signal ? { signal } : {});
}

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: pourKeys.members(),
    queryFn: ({ signal }) => getMembers(signal),
  });

export function useMembers() {
  return useQuery(membersQueryOptions());
}
