import { PourListQuery } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { boardPageCount, cureBoardQuery, readCureBoardFilters } from './cure-board-filters';

// Reference: the WHATWG URL parser reads back the links we build, and the API's own query schema accepts the query.
describe('cure board filters', () => {
  it('reads back every filter from its link', () => {
    const url = new URL(paths.cureBoard.getHref({ status: 'released', readyToday: true, page: 3 }), 'https://shop.example');
    expect(readCureBoardFilters(url.searchParams)).toEqual({ status: 'released', readyToday: true, page: 3 });
  });

  it('leaves the defaults out of the link and falls back to them', () => {
    expect(paths.cureBoard.getHref()).toBe('/cure-board');
    expect(paths.cureBoard.getHref({ status: 'active', readyToday: false, page: 1 })).toBe('/cure-board');
    expect(readCureBoardFilters(new URLSearchParams('status=odd&page=-4&readyToday=yes'))).toEqual({ status: 'active', readyToday: false, page: 1 });
  });

  it('asks the API for 50 pours a page, in a query its schema accepts', () => {
    const query = cureBoardQuery({ status: 'all', readyToday: true, page: 2 });
    expect(query).toEqual({ status: 'all', readyToday: 'true', limit: 50, offset: 50 });
    const search = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]));
    expect(PourListQuery.safeParse(Object.fromEntries(search)).success).toBe(true);
  });

  it('counts pages of 50', () => {
    expect(boardPageCount(0)).toBe(1);
    expect(boardPageCount(50)).toBe(1);
    expect(boardPageCount(51)).toBe(2);
  });
});
