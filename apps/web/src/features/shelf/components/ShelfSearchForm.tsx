import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';
import { lotParts } from '../utils/lot-parts';
import { lotStateWords } from '../utils/lot-status';
import { lotStatuses, type ShelfFilters } from '../utils/shelf-queries';
import { lotPartWords } from '../utils/shelf-words';

const statusOptions = lotStatuses.map((status) => ({ value: status, label: lotStateWords[status].label }));
const partOptions = lotParts.map((part) => ({ value: part, label: lotPartWords[part] }));

const searchHints = {
  'resin-systems': 'Part of the product name.',
  pigments: 'Part of the pigment name.',
  lots: 'Lot number or product name.',
} as const;

/** Filters live in the address, so a filtered shelf can be bookmarked and reloaded; a new search starts on page 1. */
export function ShelfSearchForm({ filters }: { filters: ShelfFilters }) {
  const navigate = useNavigate();
  const [q, setQ] = useState(filters.q ?? '');
  const [archived, setArchived] = useState(Boolean(filters.includeArchived));
  const [status, setStatus] = useState<string>(filters.status ?? '');
  const [part, setPart] = useState<string>(filters.part ?? '');
  const lots = filters.tab === 'lots';
  const filtered = Boolean(filters.q || filters.includeArchived || filters.status || filters.part);

  return (
    <form
      role="search"
      aria-label="Search the shelf"
      className="mb-6 flex flex-col gap-4 rounded-xl border border-line bg-white p-4 md:flex-row md:flex-wrap md:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        void navigate(
          paths.shelf.getHref({
            tab: filters.tab,
            q: q.trim(),
            ...(filters.sort ? { sort: filters.sort.key, dir: filters.sort.direction } : {}),
            ...(lots ? { status, part } : { archived }),
          }),
        );
      }}
    >
      <Field label="Search" hint={searchHints[filters.tab]} className="md:min-w-64 md:flex-1">
        {(control) => <Input {...control} type="search" value={q} onChange={(event) => setQ(event.target.value)} maxLength={120} />}
      </Field>
      {lots ? (
        <>
          <Field label="Stock">
            {(control) => (
              <Select {...control} value={status} onChange={(event) => setStatus(event.target.value)} options={statusOptions} emptyOption="Every lot" />
            )}
          </Field>
          <Field label="Part">
            {(control) => <Select {...control} value={part} onChange={(event) => setPart(event.target.value)} options={partOptions} emptyOption="All parts" />}
          </Field>
        </>
      ) : (
        <label className="flex min-h-touch items-center gap-2 font-semibold">
          <input type="checkbox" className="size-5 accent-walnut-800" checked={archived} onChange={(event) => setArchived(event.target.checked)} />
          Show archived too
        </label>
      )}
      <div className="flex gap-2">
        <Button type="submit">Show</Button>
        {filtered ? (
          <Button
            variant="quiet"
            onClick={() => {
              setQ('');
              setArchived(false);
              setStatus('');
              setPart('');
              void navigate(paths.shelf.getHref({ tab: filters.tab }));
            }}
          >
            Clear
          </Button>
        ) : null}
      </div>
    </form>
  );
}
