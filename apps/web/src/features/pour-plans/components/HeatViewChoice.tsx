import { useId } from 'react';
import { cx } from '../../../lib/cx';

export type HeatView = 'above' | 'mould3d';

const choices: readonly { value: HeatView; label: string }[] = [
  { value: 'above', label: 'Seen from above' },
  { value: 'mould3d', label: 'On the mould in 3D' },
];

/** Where the forecast peak is drawn: the flat map, or the mould turned in 3D (which loads only when chosen). */
export function HeatViewChoice({ view, onChange }: { view: HeatView; onChange: (view: HeatView) => void }) {
  const id = useId();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-semibold text-ink">Show the forecast peak</legend>
      <div className="flex flex-col gap-2 sm:flex-row sm:flex-wrap">
        {choices.map((choice) => {
          const inputId = `${id}-${choice.value}`;
          return (
            <div
              key={choice.value}
              className={cx(
                'relative flex min-h-touch items-center gap-3 rounded-lg border border-line-strong bg-white px-3 py-2',
                'has-[:checked]:border-walnut-800 has-[:checked]:bg-walnut-50 has-[:checked]:ring-2 has-[:checked]:ring-walnut-800',
              )}
            >
              <input
                id={inputId}
                type="radio"
                name={`${id}-view`}
                value={choice.value}
                checked={view === choice.value}
                onChange={() => onChange(choice.value)}
                className="relative z-10 size-5 accent-walnut-800"
              />
              <label htmlFor={inputId} className="cursor-pointer font-semibold after:absolute after:inset-0 after:content-['']">
                {choice.label}
              </label>
            </div>
          );
        })}
      </div>
    </fieldset>
  );
}
