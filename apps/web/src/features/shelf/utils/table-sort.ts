export type SortDirection = 'ascending' | 'descending';

export interface SortState {
  key: string;
  direction: SortDirection;
}

const maxKeyLength = 40;

export function readSortParam(key: string | null, direction: string | null): SortState | undefined {
  if (!key || key.length > maxKeyLength || !/^[A-Za-z]+$/.test(key)) return undefined;
  return { key, direction: direction === 'descending' ? 'descending' : 'ascending' };
}

/** A header pressed once sorts up, pressed again sorts down; another header starts again going up. */
export function nextSort(current: SortState | undefined, key: string): SortState {
  if (current?.key === key) return { key, direction: current.direction === 'ascending' ? 'descending' : 'ascending' };
  return { key, direction: 'ascending' };
}

/** What a header's aria-sort says: only the sorted column has one other than "none". */
export function ariaSortOf(current: SortState | undefined, key: string): SortDirection | 'none' {
  return current?.key === key ? current.direction : 'none';
}
