import { PieceListQuery } from '@gelpoint/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths';
import { pageCount, pieceListQuery, piecesPerPage, readPieceFilters } from './piece-filters';

const fromHref = (href: string) => readPieceFilters(new URL(href, 'https://shop.example').searchParams);

describe('readPieceFilters', () => {
  it('reads stage, search and page', () => {
    expect(fromHref('/pieces?stage=curing&q=%20black%20walnut%20&page=3')).toEqual({ stage: 'curing', q: 'black walnut', page: 3 });
  });

  it.each(['/pieces?stage=drying', '/pieces?page=0', '/pieces?page=-2', '/pieces?page=2.5', '/pieces?page=abc', '/pieces?q=%20%20'])(
    'falls back to the first page of everything for %s',
    (href) => {
      expect(fromHref(href)).toEqual({ page: 1 });
    },
  );

  it('caps the search at what the API accepts', () => {
    expect(fromHref(`/pieces?q=${'a'.repeat(300)}`).q).toHaveLength(120);
  });

  // Reference: the WHATWG URL parser reads back the links paths.pieces builds.
  it('reads back any link built by paths.pieces', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(undefined, 'planning', 'pouring', 'curing', 'ready', 'released', 'finishing', 'done' as const),
        fc.option(
          fc
            .string({ maxLength: 40 })
            .map((s) => s.trim())
            .filter((s) => s.length > 0),
          { nil: undefined },
        ),
        fc.integer({ min: 1, max: 10_000 }),
        (stage, q, page) => {
          const filters = fromHref(paths.pieces.getHref({ stage, q, page }));
          expect(filters).toEqual({ page, ...(stage ? { stage } : {}), ...(q ? { q } : {}) });
        },
      ),
    );
  });
});

describe('pieceListQuery', () => {
  it('turns a page into an offset', () => {
    expect(pieceListQuery({ page: 3, stage: 'ready' })).toEqual({ stage: 'ready', limit: piecesPerPage, offset: 2 * piecesPerPage });
  });

  it('only ever asks for what the API contract accepts', () => {
    fc.assert(
      fc.property(fc.string(), fc.string(), fc.string(), (stage, q, page) => {
        const query = pieceListQuery(readPieceFilters(new URLSearchParams({ stage, q, page })));
        expect(PieceListQuery.safeParse(query).success).toBe(true);
      }),
    );
  });
});

describe('pageCount', () => {
  it('rounds up and never says zero pages', () => {
    expect(pageCount(0)).toBe(1);
    expect(pageCount(piecesPerPage)).toBe(1);
    expect(pageCount(piecesPerPage + 1)).toBe(2);
  });
});
