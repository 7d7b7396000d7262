import type { Piece } from '@gelpoint/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';

/** The piece filter lives in the address, so a piece's plans can be linked to. */
export function PlanPieceFilter({ pieces, pieceId }: { pieces: readonly Piece[]; pieceId: string | undefined }) {
  const navigate = useNavigate();
  const [chosen, setChosen] = useState(pieceId ?? '');
  return (
    <form
      role="search"
      aria-label="Filter pour plans"
      className="mb-6 flex flex-col gap-4 rounded-xl border border-line bg-white p-4 sm:flex-row sm:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        void navigate(paths.pourPlans.getHref(chosen ? { pieceId: chosen } : {}));
      }}
    >
      <Field label="Piece" className="sm:min-w-72">
        {(control) => (
          <Select
            {...control}
            value={chosen}
            onChange={(event) => setChosen(event.target.value)}
            options={pieces.map((p) => ({ value: p.id, label: p.name }))}
            emptyOption="Every piece"
          />
        )}
      </Field>
      <Button type="submit">Show</Button>
    </form>
  );
}
