import { useId } from 'react';
import { cx } from '../../../lib/cx';
import type { Dam } from '../types';

const choices: readonly { value: Dam; label: string; hint: string }[] = [
  { value: 'outline', label: 'Dams along the outline', hint: 'Resin only where the mould’s own walls hold it.' },
  { value: 'box', label: 'Box dam', hint: 'A box around the whole bounding box: resin also fills around the outside up to the level.' },
];

export const damWords: Record<Dam, string> = { outline: 'dams along the outline', box: 'a box dam' };

/** How the pour is held in: radio buttons, each with one line that says what it means. */
export function DamChoice({ dam, onChange }: { dam: Dam; onChange: (dam: Dam) => void }) {
  const id = useId();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-base font-semibold text-ink">What holds the resin in</legend>
      <div className="flex flex-col gap-2 sm:flex-row sm:flex-wrap">
        {choices.map((choice) => {
          const inputId = `${id}-${choice.value}`;
          return (
            <div
              key={choice.value}
              className={cx(
                'relative flex min-h-touch flex-1 items-start gap-3 rounded-lg border border-line-strong bg-white px-3 py-2',
                'has-[:checked]:border-walnut-800 has-[:checked]:bg-walnut-50 has-[:checked]:ring-2 has-[:checked]:ring-walnut-800',
              )}
            >
              <input
                id={inputId}
                type="radio"
                name={`${id}-dam`}
                value={choice.value}
                checked={dam === choice.value}
                onChange={() => onChange(choice.value)}
                aria-describedby={`${inputId}-hint`}
                className="relative z-10 mt-1 size-5 accent-walnut-800"
              />
              <span className="flex flex-col">
                <label htmlFor={inputId} className="cursor-pointer font-semibold after:absolute after:inset-0 after:content-['']">
                  {choice.label}
                </label>
                <span id={`${inputId}-hint`} className="text-sm text-ink-soft">
                  {choice.hint}
                </span>
              </span>
            </div>
          );
        })}
      </div>
    </fieldset>
  );
}
