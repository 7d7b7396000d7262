import { LotListQuery, LotSort, PigmentListQuery, PigmentSort, ResinSystemListQuery, ResinSystemSort } from '@gelpoint/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { shelfKeys } from '../api/keys';
import { lotsQueryOptions } from '../api/get-lots';
import { lotListQuery, pigmentListQuery, readShelfFilters, resinSystemListQuery, shelfLinkOf, shelfPageCount, shelfRowsPerPage } from './shelf-queries';

const sortsOf = { 'resin-systems': ResinSystemSort.options, pigments: PigmentSort.options, lots: LotSort.options } as const;

const fromHref = (href: string) => readShelfFilters(new URL(href, 'https://shop.example').searchParams);

describe('readShelfFilters', () => {
  it('starts on the resin systems, first page, nothing filtered', () => {
    expect(fromHref('/shelf')).toEqual({ tab: 'resin-systems', page: 1 });
  });

  it('reads a lot filter with its sort', () => {
    expect(fromHref('/shelf?tab=lots&q=%20A-117%20&status=low&part=B&page=4&sort=expires&dir=descending')).toEqual({
      tab: 'lots',
      q: 'A-117',
      status: 'low',
      part: 'B',
      page: 4,
      sort: { key: 'expires', direction: 'descending' },
    });
  });

  it('keeps only the columns the tab’s table sorts by', () => {
    expect(fromHref('/shelf?tab=lots&sort=name').sort).toBeUndefined();
    expect(fromHref('/shelf?sort=kind').sort).toBeUndefined();
    expect(fromHref('/shelf?tab=pigments&sort=potLife').sort).toBeUndefined();
    expect(fromHref('/shelf?tab=pigments&sort=kind').sort).toEqual({ key: 'kind', direction: 'ascending' });
    expect(fromHref('/shelf?sort=potLife&dir=descending').sort).toEqual({ key: 'potLife', direction: 'descending' });
  });

  it('keeps lot filters off the products and the archive switch off the lots', () => {
    expect(fromHref('/shelf?tab=pigments&status=low&part=A&archived=true')).toEqual({ tab: 'pigments', page: 1, includeArchived: true });
    expect(fromHref('/shelf?tab=lots&archived=true')).toEqual({ tab: 'lots', page: 1 });
  });

  it.each(['/shelf?tab=drawers', '/shelf?page=0', '/shelf?page=1.5', '/shelf?tab=lots&status=mouldy&part=C'])(
    'drops what the API would refuse in %s',
    (href) => {
      const filters = fromHref(href);
      expect(filters.page).toBe(1);
      expect(filters.status).toBeUndefined();
      expect(filters.part).toBeUndefined();
    },
  );

  // Reference: the WHATWG URL parser reads back every link paths.shelf builds.
  it('reads back any shelf link', () => {
    fc.assert(
      fc.property(
        fc
          .constantFrom('resin-systems', 'pigments', 'lots' as const)
          .chain((tab) => fc.tuple(fc.constant(tab), fc.option(fc.constantFrom(...sortsOf[tab]), { nil: undefined }))),
        fc.option(
          fc
            .string({ maxLength: 30 })
            .map((s) => s.trim())
            .filter(Boolean),
          { nil: undefined },
        ),
        fc.integer({ min: 1, max: 5000 }),
        fc.constantFrom('ascending', 'descending' as const),
        ([tab, sort], q, page, dir) => {
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
    expect(pigmentListQuery({ tab: 'pigments', page: 3, q: 'blue', includeArchived: true })).toEqual({
      q: 'blue',
      includeArchived: 'true',
      limit: shelfRowsPerPage,
      offset: 2 * shelfRowsPerPage,
    });
    expect(shelfRowsPerPage).toBe(50);
    expect(lotListQuery({ tab: 'lots', page: 20, status: 'expired' })).toEqual({ status: 'expired', limit: 50, offset: 950 });
  });

  it('asks the server for the chosen column and direction, which the list’s cache key holds', () => {
    const lots = lotListQuery({ tab: 'lots', page: 1, sort: { key: 'remaining', direction: 'descending' } });
    expect(lots).toEqual({ sort: 'remaining', dir: 'desc', limit: 50, offset: 0 });
    expect(lotsQueryOptions(lots).queryKey).toContainEqual(expect.objectContaining({ sort: 'remaining', dir: 'desc' }));
    const upward = lotListQuery({ tab: 'lots', page: 1, sort: { key: 'remaining', direction: 'ascending' } });
    expect(JSON.stringify(lotsQueryOptions(upward).queryKey)).not.toBe(JSON.stringify(lotsQueryOptions(lots).queryKey));
    expect(resinSystemListQuery({ tab: 'resin-systems', page: 2, sort: { key: 'pricePerKg', direction: 'ascending' } })).toEqual({
      sort: 'pricePerKg',
      dir: 'asc',
      limit: 50,
      offset: 50,
    });
    expect(shelfKeys.pigmentList(pigmentListQuery({ tab: 'pigments', page: 1, sort: { key: 'maxLoading', direction: 'descending' } }))).toContainEqual(
      expect.objectContaining({ sort: 'maxLoading', dir: 'desc' }),
    );
    // Nothing chosen: the server's own order (expiry for lots, name for products), and no sort in the key.
    expect(lotListQuery({ tab: 'lots', page: 1 })).toEqual({ limit: 50, offset: 0 });
    // A column of another table never reaches the API.
    expect(pigmentListQuery({ tab: 'pigments', page: 1, sort: { key: 'potLife', direction: 'ascending' } })).toEqual({ limit: 50, offset: 0 });
  });

  it('only ever sends what the API contracts accept', () => {
    fc.assert(
      fc.property(
        fc.string(),
        fc.string(),
        fc.string(),
        fc.string(),
        fc.string(),
        fc.oneof(fc.string(), fc.constantFrom(...ResinSystemSort.options, ...PigmentSort.options, ...LotSort.options)),
        fc.oneof(fc.string(), fc.constantFrom('ascending', 'descending')),
        (tab, q, page, status, part, sort, dir) => {
          const filters = readShelfFilters(new URLSearchParams({ tab, q, page, status, part, sort, dir, archived: 'true' }));
          expect(ResinSystemListQuery.safeParse(resinSystemListQuery(filters)).success).toBe(true);
          expect(PigmentListQuery.safeParse(pigmentListQuery(filters)).success).toBe(true);
          expect(LotListQuery.safeParse(lotListQuery(filters)).success).toBe(true);
        },
      ),
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
    const filters = {
      tab: 'lots' as const,
      page: 3,
      q: 'A-1',
      sort: { key: 'expires', direction: 'descending' as const },
      status: 'low' as const,
      part: 'A' as const,
    };
    expect(fromHref(paths.shelf.getHref(shelfLinkOf(filters)))).toEqual(filters);
  });
});
