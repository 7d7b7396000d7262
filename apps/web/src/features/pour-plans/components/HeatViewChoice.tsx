import { useId } from 'react';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';

export type HeatView = 'above' | 'mould3d';

const choices: readonly { value: HeatView; label: string }[] = [
  { value: 'above', label: 'Seen from above' },
  { value: 'mould3d', label: 'On the mould in 3D' },
];

/** Where the forecast peak is drawn: the flat map, or the mould turned in 3D (which loads only when chosen). */
export function HeatViewChoice({ view, onChange }: { view: HeatView; onChange: (view: HeatView) => void }) {
  const name = useId();
  return (
    <ChoiceGroup
      legend="Show the forecast peak"
      choices={choices}
      value={view}
      inputProps={{
        name,
        onChange: (event) => {
          const picked = choices.find((c) => c.value === event.target.value);
          if (picked) onChange(picked.value);
        },
      }}
    />
  );
}
