import { LotListQuery, ShelfListQuery } from '@gelpoint/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { catalogueListQuery, lotListQuery, readShelfFilters, shelfLinkOf, shelfPageCount, shelfRowsPerPage } from './shelf-queries';

const fromHref = (href: string) => readShelfFilters(new URL(href, 'https://shop.example').searchParams);

describe('readShelfFilters', () => {
  it('starts on the resin systems, first page, nothing filtered', () => {
    expect(fromHref('/shelf')).toEqual({ tab: 'resin-systems', page: 1 });
  });

  it('reads a lot filter with its sort', () => {
    expect(fromHref('/shelf?tab=lots&q=%20A-117%20&status=low&part=B&page=4&sort=expiresOn&dir=descending')).toEqual({
      tab: 'lots',
      q: 'A-117',
      status: 'low',
      part: 'B',
      page: 4,
      sort: { key: 'expiresOn', direction: 'descending' },
    });
  });

  it('keeps lot filters off the products and the archive switch off the lots', () => {
    expect(fromHref('/shelf?tab=pigments&status=low&part=A&archived=true')).toEqual({ tab: 'pigments', page: 1, includeArchived: true });
    expect(fromHref('/shelf?tab=lots&archived=true')).toEqual({ tab: 'lots', page: 1 });
  });

  it.each(['/shelf?tab=drawers', '/shelf?page=0', '/shelf?page=1.5', '/shelf?tab=lots&status=mouldy&part=C'])('drops what the API would refuse in %s', (href) => {
    const filters = fromHref(href);
    expect(filters.page).toBe(1);
    expect(filters.status).toBeUndefined();
    expect(filters.part).toBeUndefined();
  });

  // Reference: the WHATWG URL parser reads back every link paths.shelf builds.
  it('reads back any shelf link', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('resin-systems', 'pigments', 'lots' as const),
        fc.option(fc.string({ maxLength: 30 }).map((s) => s.trim()).filter(Boolean), { nil: undefined }),
        fc.integer({ min: 1, max: 5000 }),
        fc.option(fc.constantFrom('name', 'remainingG', 'expiresOn'), { nil: undefined }),
        fc.constantFrom('ascending', 'descending' as const),
        (tab, q, page, sort, dir) => {
          const filters = fromHref(paths.shelf.getHref({ tab, q, page, sort, dir }));
          expect(filters.tab).toBe(tab);
          expect(filters.q).toBe(q);
          expect(filters.page).toBe(page);
          expect(filters.sort).toEqual(sort ? { key: sort, direction: dir } : undefined);
        },
      ),
    );
  });
});

describe('list queries', () => {
  it('asks for fifty rows a page', () => {
    expect(catalogueListQuery({ tab: 'pigments', page: 3, q: 'blue', includeArchived: true })).toEqual({
      q: 'blue',
      includeArchived: 'true',
      limit: shelfRowsPerPage,
      offset: 2 * shelfRowsPerPage,
    });
    expect(shelfRowsPerPage).toBe(50);
    expect(lotListQuery({ tab: 'lots', page: 20, status: 'expired' })).toEqual({ status: 'expired', limit: 50, offset: 950 });
  });

  it('only ever sends what the API contracts accept', () => {
    fc.assert(
      fc.property(fc.string(), fc.string(), fc.string(), fc.string(), fc.string(), (tab, q, page, status, part) => {
        const filters = readShelfFilters(new URLSearchParams({ tab, q, page, status, part, archived: 'true' }));
        expect(ShelfListQuery.safeParse(catalogueListQuery(filters)).success).toBe(true);
        expect(LotListQuery.safeParse(lotListQuery(filters)).success).toBe(true);
      }),
    );
  });

  it('counts pages up, never zero', () => {
    expect(shelfPageCount(0)).toBe(1);
    expect(shelfPageCount(1000)).toBe(20);
    expect(shelfPageCount(1001)).toBe(21);
  });
});

describe('shelfLinkOf', () => {
  // Reference: the WHATWG URL parser; a link built from filters reads back as the same filters.
  it('links back to the same filters', () => {
    const filters = { tab: 'lots' as const, page: 3, q: 'A-1', sort: { key: 'expiresOn', direction: 'descending' as const }, status: 'low' as const, part: 'A' as const };
    expect(fromHref(paths.shelf.getHref(shelfLinkOf(filters)))).toEqual(filters);
  });
});
