import type { ReactNode } from 'react';

export interface DataSheetGroup {
  title: string;
  rows: readonly { term: string; value: ReactNode }[];
}

/** A read-only data sheet in the same groups as the form, for everyone who reads the shelf but does not keep it. */
export function DataSheet({ groups }: { groups: readonly DataSheetGroup[] }) {
  return (
    <div className="grid gap-4 md:grid-cols-2">
      {groups.map((group) => (
        <section key={group.title} className="rounded-xl border border-line bg-white p-4">
          <h2 className="mb-3 text-lg font-bold text-walnut-900">{group.title}</h2>
          <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-2">
            {group.rows.map((row) => (
              <div key={row.term} className="contents">
                <dt className="text-ink-soft">{row.term}</dt>
                <dd className="text-right font-semibold">{row.value}</dd>
              </div>
            ))}
          </dl>
        </section>
      ))}
    </div>
  );
}
