import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { FieldError } from './Field';

export interface Choice {
  value: string;
  label: string;
  hint?: string;
}

export interface ChoiceGroupProps {
  legend: ReactNode;
  choices: readonly Choice[];
  error?: string | undefined;
  /** The chosen value, for a group held in a component's state rather than registered with a form. */
  value?: string;
  /** Props for every radio input, e.g. what react-hook-form's register() returns. */
  inputProps: Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'value' | 'id'>;
}

/** Radio buttons in a fieldset: each choice is its own labelled, full-height target. */
export function ChoiceGroup({ legend, choices, error, value, inputProps }: ChoiceGroupProps) {
  const id = useId();
  const errorId = error ? `${id}-error` : undefined;
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={errorId}>
      <legend className="mb-1 text-base font-semibold text-ink">{legend}</legend>
      <div className="flex flex-col gap-2 sm:flex-row sm:flex-wrap">
        {choices.map((choice) => {
          const inputId = `${id}-${choice.value}`;
          const hintId = choice.hint ? `${inputId}-hint` : undefined;
          // The label stretches over the whole card, so the card is one big target while the name stays the label; the
          // radio sits above that stretch, so a press on the dot itself lands on the radio.
          return (
            <div
              key={choice.value}
              className={cx(
                'relative flex min-h-touch items-start gap-3 rounded-lg border border-line-strong bg-white px-3 py-2',
                'has-[:checked]:border-walnut-800 has-[:checked]:bg-walnut-50 has-[:checked]:ring-2 has-[:checked]:ring-walnut-800',
              )}
            >
              <input
                id={inputId}
                type="radio"
                value={choice.value}
                aria-describedby={hintId}
                className="relative z-10 mt-1 size-5 accent-walnut-800"
                {...inputProps}
                {...(value === undefined ? {} : { checked: value === choice.value })}
              />
              <span className="flex flex-col">
                <label htmlFor={inputId} className="cursor-pointer font-semibold after:absolute after:inset-0 after:content-['']">
                  {choice.label}
                </label>
                {choice.hint ? (
                  <span id={hintId} className="text-sm text-ink-soft">
                    {choice.hint}
                  </span>
                ) : null}
              </span>
            </div>
          );
        })}
      </div>
      {error ? <FieldError id={errorId}>{error}</FieldError> : null}
    </fieldset>
  );
}
