import { PieceStage } from '@gelpoint/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';
import type { PieceFilters } from '../utils/piece-filters';
import { stageOptions } from '../utils/stage-options';

/** Filters live in the address, so a filtered list can be bookmarked, shared and reloaded. */
export function PieceFilterForm({ filters }: { filters: PieceFilters }) {
  const navigate = useNavigate();
  const [stage, setStage] = useState<string>(filters.stage ?? '');
  const [q, setQ] = useState(filters.q ?? '');
  const filtered = Boolean(filters.stage || filters.q);

  return (
    <form
      role="search"
      aria-label="Filter pieces"
      className="mb-6 grid gap-4 rounded-xl border border-line bg-white p-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_auto] sm:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        const chosen = PieceStage.safeParse(stage);
        void navigate(paths.pieces.getHref({ stage: chosen.success ? chosen.data : undefined, q: q.trim() }));
      }}
    >
      <Field label="Search pieces" hint="Name, wood or notes.">
        {(control) => <Input {...control} type="search" value={q} onChange={(event) => setQ(event.target.value)} maxLength={120} />}
      </Field>
      <Field label="Stage">
        {(control) => <Select {...control} value={stage} onChange={(event) => setStage(event.target.value)} options={stageOptions} emptyOption="All stages" />}
      </Field>
      <div className="flex gap-2">
        <Button type="submit">Show</Button>
        {filtered ? (
          <Button
            variant="quiet"
            onClick={() => {
              setStage('');
              setQ('');
              void navigate(paths.pieces.getHref());
            }}
          >
            Clear
          </Button>
        ) : null}
      </div>
    </form>
  );
}
