import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { moldListQueryOptions, type MoldListQuery } from '../../../lib/resources/molds';
import { isAnalysing } from '../utils/mold-status';

// The list only shows a status word, so it checks back less often than a mould's own page.
const listPollMs = 2000;

export const moldsQueryOptions = (query: MoldListQuery) =>
  queryOptions({
    ...moldListQueryOptions(query),
    placeholderData: keepPreviousData,
    refetchInterval: (q) => (q.state.data?.items.some((mold) => isAnalysing(mold.status)) ? listPollMs : false),
  });

export function useMolds(query: MoldListQuery) {
  return useQuery(moldsQueryOptions(query));
}
