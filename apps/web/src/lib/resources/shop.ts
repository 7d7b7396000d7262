import { queryOptions } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

// The shop and its people, read by nearly every area (units, scale step, who to notify, whose events the audit shows):
// one cache entry each, so a change made in the settings or the team page is what every other page shows next.
export const shopResourceKeys = {
  all: ['shop'] as const,
  shop: () => [...shopResourceKeys.all, 'detail'] as const,
  members: () => [...shopResourceKeys.all, 'members'] as const,
};

export const getShop = (signal?: AbortSignal) => callRoute('getShop', {}, signal ? { signal } : {});

export const getMembers = (signal?: AbortSignal) => callRoute('listMembers', {}, signal ? { signal } : {});

/** The shop's settings: its units, scale step, currency and cure-log settings. */
export const shopQueryOptions = () =>
  queryOptions({
    queryKey: shopResourceKeys.shop(),
    queryFn: ({ signal }) => getShop(signal),
  });

/** The shop's members with their roles. */
export const membersQueryOptions = () =>
  queryOptions({
    queryKey: shopResourceKeys.members(),
    queryFn: ({ signal }) => getMembers(signal),
  });
