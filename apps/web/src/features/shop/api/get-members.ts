import { useQuery } from '@tanstack/react-query';
import { membersQueryOptions } from '../../../lib/resources/shop';

/** The shop's people, for choosing whose events the audit shows. */
export function useMembers() {
  return useQuery(membersQueryOptions());
}
