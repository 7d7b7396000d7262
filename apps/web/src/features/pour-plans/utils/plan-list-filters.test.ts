import { PourPlanListQuery } from '@gelpoint/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { planListQuery, readPlanListFilters } from './plan-list-filters';

const id = '0f8c2a4e-7b1d-4c39-9e55-2d6a1b3c4d5e';
const fromHref = (href: string) => readPlanListFilters(new URL(href, 'https://shop.example').searchParams);

describe('plan list filters', () => {
  // Reference: the WHATWG URL parser reads back the links paths.pourPlans builds.
  it('reads back the piece filter and the page', () => {
    expect(fromHref(paths.pourPlans.getHref({ pieceId: id, page: 2 }))).toEqual({ pieceId: id, page: 2 });
    expect(fromHref(paths.pourPlans.getHref())).toEqual({ page: 1 });
    expect(fromHref('/pour-plans?pieceId=not-an-id')).toEqual({ page: 1 });
  });

  // Reference: the API's own zod contract for the list.
  it('only asks for what the API accepts', () => {
    fc.assert(
      fc.property(fc.string(), fc.string(), (pieceId, page) => {
        expect(PourPlanListQuery.safeParse(planListQuery(readPlanListFilters(new URLSearchParams({ pieceId, page })))).success).toBe(true);
      }),
    );
    expect(planListQuery({ page: 3, pieceId: id })).toEqual({ pieceId: id, limit: 50, offset: 100 });
  });
});
