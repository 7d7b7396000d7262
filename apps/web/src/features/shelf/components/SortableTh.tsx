import type { ReactNode } from 'react';
import { Th } from '../../../components/ui/Table';
import { ariaSortOf, type SortState } from '../utils/table-sort';

export interface SortableThProps<Column extends string> {
  /** The column as the API names it; the table's onSort only takes its own columns. */
  sortKey: Column;
  sort: SortState | undefined;
  onSort: (key: Column) => void;
  children: ReactNode;
  className?: string;
}

// An arrow for the direction and a double arrow for "not sorted", so the state reads without colour.
const arrows = {
  ascending: <path d="M8 3.5v9M4.5 7 8 3.5 11.5 7" />,
  descending: <path d="M8 3.5v9M4.5 9 8 12.5 11.5 9" />,
  none: <path d="M5 6 8 3l3 3M5 10l3 3 3-3" />,
};

/** A column header that sorts its table; aria-sort tells a screen reader which column is sorted and which way. */
export function SortableTh<Column extends string>({ sortKey, sort, onSort, children, className }: SortableThProps<Column>) {
  const state = ariaSortOf(sort, sortKey);
  return (
    <Th aria-sort={state} className={className}>
      <button
        type="button"
        onClick={() => onSort(sortKey)}
        className="-mx-2 inline-flex min-h-touch items-center gap-1.5 rounded px-2 font-semibold text-ink-soft hover:text-walnut-900"
      >
        <span>{children}</span>
        <svg
          aria-hidden="true"
          viewBox="0 0 16 16"
          className="size-4 shrink-0 fill-none stroke-current stroke-[1.8]"
          strokeLinecap="round"
          strokeLinejoin="round"
        >
          {arrows[state]}
        </svg>
      </button>
    </Th>
  );
}
