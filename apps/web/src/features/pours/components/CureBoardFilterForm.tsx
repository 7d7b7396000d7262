import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';
import { boardStatuses, boardStatusLabels, type BoardStatus, type CureBoardFilters } from '../utils/cure-board-filters';

const statusOptions = boardStatuses.map((status) => ({ value: status, label: boardStatusLabels[status] }));

/** The board's filters live in the address, so a lead can keep "ready today" as a bookmark. */
export function CureBoardFilterForm({ filters }: { filters: CureBoardFilters }) {
  const navigate = useNavigate();
  const [status, setStatus] = useState<BoardStatus>(filters.status);
  const [readyToday, setReadyToday] = useState(filters.readyToday);
  return (
    <form
      role="search"
      aria-label="Filter the cure board"
      className="mb-6 grid gap-4 rounded-xl border border-line bg-white p-4 sm:grid-cols-[minmax(0,1fr)_auto_auto] sm:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        void navigate(paths.cureBoard.getHref({ status, readyToday }));
      }}
    >
      <Field label="Pours">
        {(control) => (
          <Select
            {...control}
            value={status}
            onChange={(event) => setStatus(boardStatuses.find((s) => s === event.target.value) ?? 'active')}
            options={statusOptions}
          />
        )}
      </Field>
      <label className="flex min-h-touch items-center gap-3 font-semibold">
        <input type="checkbox" className="size-6 accent-walnut-800" checked={readyToday} onChange={(event) => setReadyToday(event.target.checked)} />
        Ready today
      </label>
      <Button type="submit">Show</Button>
    </form>
  );
}
