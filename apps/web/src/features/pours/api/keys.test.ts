import { partialMatchKey } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { pourListQueryOptions } from '../../../lib/resources/pours';
import { pourKeys } from './keys';

// Reference: TanStack Query's own prefix matcher, which invalidateQueries uses to pick what to refetch.
describe('pourKeys', () => {
  const list = pourKeys.list({ status: 'active', readyToday: 'false', limit: 50, offset: 0 });
  const detail = pourKeys.detail('5f3c1c2e-0000-4000-8000-000000000001');

  it('reaches every board page and no pour page with lists()', () => {
    expect(partialMatchKey(list, pourKeys.lists())).toBe(true);
    expect(partialMatchKey(detail, pourKeys.lists())).toBe(false);
  });

  it('reaches the board, the pour pages and Today with all', () => {
    for (const key of [list, detail, pourKeys.today()]) expect(partialMatchKey(key, pourKeys.all)).toBe(true);
  });

  it('keeps two filters and two pours apart', () => {
    expect(partialMatchKey(pourKeys.list({ status: 'all', readyToday: 'true', limit: 50, offset: 0 }), list)).toBe(false);
    expect(partialMatchKey(pourKeys.detail('other'), detail)).toBe(false);
  });

  it("reaches a plan's latest pour (its run sheet's codes) when a pour is started, as every other page of pours", () => {
    const latestOfPlan = pourListQueryOptions({ pourPlanId: '5f3c1c2e-0000-4000-8000-000000000002', status: 'all', limit: 1 }).queryKey;
    expect(partialMatchKey(latestOfPlan, pourKeys.lists())).toBe(true);
  });
});
