import { formatLength, type UnitSystem } from '@gelpoint/core';
import { useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { lengthInputStep, lengthInputValue, mmToShopLength, readLengthInput, shopLengthToMm, shopLengthUnit } from '../utils/length-input';

export interface FillLevelControlProps {
  /** Height of the resin surface above the cavity floor, mm. */
  heightMm: number;
  /** From the cavity floor to the top of the mould: the highest level there is. */
  spanMm: number;
  /** Where the cavity floor stands in the mould file's own frame, mm: the second reading of the level. */
  floorInMouldMm: number;
  unitSystem: UnitSystem;
  onChange: (heightMm: number) => void;
}

/**
 * A slider for feel and a number for precision, both on the same level in the shop's length unit, measured from the
 * cavity floor; below them the same level read in the mould file's own frame, as a CAD program shows it.
 */
export function FillLevelControl({ heightMm, spanMm, floorInMouldMm, unitSystem, onChange }: FillLevelControlProps) {
  const [text, setText] = useState(() => lengthInputValue(heightMm, unitSystem));
  const [error, setError] = useState<string | null>(null);
  const unit = shopLengthUnit(unitSystem);
  const bounds = { minMm: 0, maxMm: spanMm };

  const typed = (next: string) => {
    setText(next);
    const read = readLengthInput(next, unitSystem, bounds, 'Fill level');
    if (!read.ok) {
      setError(read.error.message);
      return;
    }
    setError(null);
    onChange(read.value);
  };

  const slid = (next: number) => {
    const levelMm = Math.min(spanMm, Math.max(0, shopLengthToMm(next, unitSystem)));
    setText(lengthInputValue(levelMm, unitSystem));
    setError(null);
    onChange(levelMm);
  };

  return (
    <div className="flex flex-col gap-3">
      <Field
        label="Fill level"
        hint={`Height of the resin surface above the cavity floor (where the deepest resin stands), in ${unit}: from 0 to ${formatLength(spanMm, unitSystem).text} at the top of the mould.`}
        error={error ?? undefined}
      >
        {(control) => (
          <div className="flex items-center gap-2">
            <Input {...control} inputMode="decimal" autoComplete="off" className="max-w-40 tabular-nums" value={text} onChange={(e) => typed(e.target.value)} />
            <span className="text-ink-soft">{unit}</span>
          </div>
        )}
      </Field>
      <input
        type="range"
        aria-label="Fill level, slider"
        min={0}
        max={mmToShopLength(spanMm, unitSystem)}
        step={lengthInputStep(unitSystem)}
        value={mmToShopLength(heightMm, unitSystem)}
        aria-valuetext={`${formatLength(heightMm, unitSystem).text} above the cavity floor`}
        onChange={(e) => slid(Number(e.target.value))}
        className="h-touch w-full accent-resin-500"
      />
      <p className="text-sm text-ink-soft" data-testid="level-in-mould-frame">
        In the mould file’s own frame: resin surface at {formatLength(floorInMouldMm + heightMm, unitSystem).text}, cavity floor at{' '}
        {formatLength(floorInMouldMm, unitSystem).text}.
      </p>
    </div>
  );
}
