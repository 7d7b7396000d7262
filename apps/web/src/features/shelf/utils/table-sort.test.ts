import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ariaSortOf, nextSort, readSortParam, sortRows, type SortValue } from './table-sort';

interface Row {
  name: string;
  maxLayerMm: number | null;
}

const valueOf = (row: Row, key: string): SortValue => (key === 'name' ? row.name : row.maxLayerMm);

describe('sortRows', () => {
  // Reference: ECMA-402 Intl.Collator with numeric collation, which orders digit runs by their value.
  it('orders names as people read them, numbers by value', () => {
    const rows: Row[] = [
      { name: 'Lot 10', maxLayerMm: 50 },
      { name: 'lot 9', maxLayerMm: 6 },
      { name: 'Lot 1', maxLayerMm: 25 },
    ];
    expect(sortRows(rows, { key: 'name', direction: 'ascending' }, valueOf).map((r) => r.name)).toEqual(['Lot 1', 'lot 9', 'Lot 10']);
    expect(sortRows(rows, { key: 'maxLayerMm', direction: 'descending' }, valueOf).map((r) => r.maxLayerMm)).toEqual([50, 25, 6]);
  });

  it('keeps empty values last whichever way it sorts', () => {
    const rows: Row[] = [
      { name: 'b', maxLayerMm: null },
      { name: 'a', maxLayerMm: 3 },
      { name: 'c', maxLayerMm: 9 },
    ];
    expect(sortRows(rows, { key: 'maxLayerMm', direction: 'ascending' }, valueOf).map((r) => r.name)).toEqual(['a', 'c', 'b']);
    expect(sortRows(rows, { key: 'maxLayerMm', direction: 'descending' }, valueOf).map((r) => r.name)).toEqual(['c', 'a', 'b']);
  });

  it('leaves the API order alone when nothing is chosen, without touching the input', () => {
    const rows: Row[] = [
      { name: 'z', maxLayerMm: 1 },
      { name: 'a', maxLayerMm: 2 },
    ];
    const sorted = sortRows(rows, undefined, valueOf);
    expect(sorted).toEqual(rows);
    expect(sorted).not.toBe(rows);
  });

  // Reference: ECMAScript 2019 requires Array.prototype.sort to be stable; equal rows keep their order.
  it('returns a permutation in order, equal rows in their first order', () => {
    fc.assert(
      fc.property(fc.array(fc.record({ name: fc.constantFrom('a', 'b', 'c'), maxLayerMm: fc.integer({ min: 0, max: 3 }) }), { maxLength: 30 }), (rows) => {
        const tagged = rows.map((row, i) => ({ ...row, i }));
        const sorted = sortRows(tagged, { key: 'maxLayerMm', direction: 'ascending' }, valueOf);
        expect(sorted.map((r) => r.i).sort((p, q) => p - q)).toEqual(tagged.map((r) => r.i));
        for (let k = 1; k < sorted.length; k++) {
          const [before, after] = [sorted[k - 1]!, sorted[k]!];
          expect(before.maxLayerMm).toBeLessThanOrEqual(after.maxLayerMm);
          if (before.maxLayerMm === after.maxLayerMm) expect(before.i).toBeLessThan(after.i);
        }
      }),
    );
  });
});

describe('nextSort and ariaSortOf', () => {
  it('goes up on the first press, down on the second, up again on another column', () => {
    const first = nextSort(undefined, 'name');
    expect(first).toEqual({ key: 'name', direction: 'ascending' });
    const second = nextSort(first, 'name');
    expect(second).toEqual({ key: 'name', direction: 'descending' });
    expect(nextSort(second, 'maxLayerMm')).toEqual({ key: 'maxLayerMm', direction: 'ascending' });
  });

  // Reference: WAI-ARIA 1.2, aria-sort takes ascending, descending, other or none.
  it('says the direction only on the sorted column', () => {
    const sort = { key: 'name', direction: 'descending' as const };
    expect(ariaSortOf(sort, 'name')).toBe('descending');
    expect(ariaSortOf(sort, 'maxLayerMm')).toBe('none');
    expect(ariaSortOf(undefined, 'name')).toBe('none');
  });

  it('reads only plain column names from the address', () => {
    expect(readSortParam('name', 'descending')).toEqual({ key: 'name', direction: 'descending' });
    expect(readSortParam('name', 'sideways')).toEqual({ key: 'name', direction: 'ascending' });
    expect(readSortParam('name;drop', null)).toBeUndefined();
    expect(readSortParam(null, 'descending')).toBeUndefined();
  });
});
