import type { Piece } from '@gelpoint/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { PlusIcon } from '../../../components/ui/icons';
import { Select } from '../../../components/ui/Select';
import { paths } from '../../../config/paths';

/** A pour plan belongs to a piece: pick the piece, then plan its pour. */
export function PlanAPour({ pieces, pieceId }: { pieces: readonly Piece[]; pieceId?: string | undefined }) {
  const navigate = useNavigate();
  const [chosen, setChosen] = useState(pieceId ?? '');
  const [problem, setProblem] = useState<string | undefined>(undefined);
  return (
    <form
      aria-label="Plan a pour"
      className="flex flex-col gap-3 sm:flex-row sm:items-end"
      onSubmit={(event) => {
        event.preventDefault();
        if (!chosen) {
          setProblem('choose the piece the pour is for');
          return;
        }
        void navigate(paths.newPourPlan.getHref(chosen));
      }}
    >
      <Field label="Piece to plan for" error={problem} className="sm:min-w-72">
        {(control) => (
          <Select
            {...control}
            value={chosen}
            onChange={(event) => {
              setChosen(event.target.value);
              setProblem(undefined);
            }}
            options={pieces.map((p) => ({ value: p.id, label: p.name }))}
            emptyOption="Choose a piece"
          />
        )}
      </Field>
      <Button type="submit" icon={<PlusIcon />}>
        Plan a pour
      </Button>
    </form>
  );
}
