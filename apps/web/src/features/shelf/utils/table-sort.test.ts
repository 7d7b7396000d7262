import { describe, expect, it } from 'vitest';
import { ariaSortOf, nextSort, readSortParam } from './table-sort';

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
