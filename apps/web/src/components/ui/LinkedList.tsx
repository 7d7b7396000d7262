import type { ReactNode } from 'react';
import { TextLink } from './TextLink';

export interface LinkedListRow {
  id: string;
  /** Where the row's name leads. */
  to: string;
  name: string;
  /** A line under the name: what the record holds or where it came from. */
  detail: ReactNode;
  /** Its state or age, at the row's end. */
  aside: ReactNode;
}

/** A short list of records that belong to one thing (a piece's moulds, plans or pours): each a link with a line of detail. */
export function LinkedList({ label, rows }: { label: string; rows: readonly LinkedListRow[] }) {
  return (
    <ul className="flex flex-col divide-y divide-line" aria-label={label}>
      {rows.map((row) => (
        <li key={row.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span className="flex flex-col">
            <TextLink to={row.to}>{row.name}</TextLink>
            <span className="text-sm text-ink-soft">{row.detail}</span>
          </span>
          {row.aside}
        </li>
      ))}
    </ul>
  );
}
