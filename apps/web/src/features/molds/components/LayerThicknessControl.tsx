import type { UnitSystem } from '@gelpoint/core';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { shopLengthUnit } from '../utils/length-input';

export interface LayerThicknessControlProps {
  text: string;
  error: string | null;
  unitSystem: UnitSystem;
  onChange: (text: string) => void;
}

export function LayerThicknessControl({ text, error, unitSystem, onChange }: LayerThicknessControlProps) {
  const unit = shopLengthUnit(unitSystem);
  return (
    <Field
      label="Layer thickness"
      hint={`Optional: the thickest layer the product allows (its TDS says), in ${unit}. Draws where the layers would meet.`}
      error={error ?? undefined}
    >
      {(control) => (
        <div className="flex items-center gap-2">
          <Input
            {...control}
            inputMode="decimal"
            autoComplete="off"
            className="max-w-40 tabular-nums"
            value={text}
            onChange={(e) => onChange(e.target.value)}
          />
          <span className="text-ink-soft">{unit}</span>
        </div>
      )}
    </Field>
  );
}
