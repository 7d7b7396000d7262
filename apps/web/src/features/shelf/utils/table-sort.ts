export type SortDirection = 'ascending' | 'descending';

export interface SortState {
  key: string;
  direction: SortDirection;
}

export type SortValue = string | number | null;

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

// Names sort the way people read them: "Lot 9" before "Lot 10", case and accents aside.
const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

function compareValues(a: SortValue, b: SortValue): number {
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return collator.compare(String(a), String(b));
}

/**
 * The rows in the chosen order; empty values stay last whichever way it goes, and equal rows keep the order the
 * API sent them in (the sort is stable).
 */
export function sortRows<T>(rows: readonly T[], sort: SortState | undefined, valueOf: (row: T, key: string) => SortValue): T[] {
  if (!sort) return [...rows];
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return [...rows].sort((p, q) => {
    const a = valueOf(p, sort.key);
    const b = valueOf(q, sort.key);
    if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
    return sign * compareValues(a, b);
  });
}
