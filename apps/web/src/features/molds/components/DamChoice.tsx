import { useId } from 'react';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';
import type { Dam } from '../types';

const choices: readonly { value: Dam; label: string; hint: string }[] = [
  { value: 'outline', label: 'Dams along the outline', hint: 'Resin only where the mould’s own walls hold it.' },
  { value: 'box', label: 'Box dam', hint: 'A box around the whole bounding box: resin also fills around the outside up to the level.' },
];

export const damWords: Record<Dam, string> = { outline: 'dams along the outline', box: 'a box dam' };

/** How the pour is held in: radio buttons, each with one line that says what it means. */
export function DamChoice({ dam, onChange }: { dam: Dam; onChange: (dam: Dam) => void }) {
  const name = useId();
  return (
    <ChoiceGroup
      legend="What holds the resin in"
      choices={choices}
      value={dam}
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
