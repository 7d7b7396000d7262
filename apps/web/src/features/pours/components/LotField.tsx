import type { LotView } from '@gelpoint/contracts';
import type { UnitSystem } from '@gelpoint/core';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { typedLot } from '../utils/batch-form';
import { lotOptions } from '../utils/lot-options';

export interface LotFieldProps {
  /** "part A", "part B", "pigment". */
  part: string;
  productName: string;
  lots: readonly LotView[];
  choice: string;
  unitSystem: UnitSystem;
  choiceProps: UseFormRegisterReturn;
  numberProps: UseFormRegisterReturn;
  numberError?: string | undefined;
}

/** Pick the lot from the shelf, or type the number off the can when it is not listed. */
export function LotField({ part, productName, lots, choice, unitSystem, choiceProps, numberProps, numberError }: LotFieldProps) {
  const options = lotOptions(lots, unitSystem);
  const typing = options.length === 0 || choice === typedLot;
  return (
    <div className="flex flex-col gap-3">
      {options.length > 0 ? (
        <Field label={`Lot of ${part}`} hint={`${productName}: lots on the shelf with stock left.`}>
          {(control) => (
            <Select
              {...control}
              className="min-h-12!"
              emptyOption="Choose a lot…"
              options={[...options, { value: typedLot, label: 'Not listed: type the number' }]}
              {...choiceProps}
            />
          )}
        </Field>
      ) : null}
      {typing ? (
        <Field
          label={`Lot number of ${part}`}
          hint={options.length === 0 ? `Copy it from the label of ${productName}; the shelf lists no lot of it with stock left.` : 'Copy it from the label.'}
          error={numberError}
        >
          {(control) => <Input {...control} className="min-h-12!" autoComplete="off" autoCapitalize="characters" maxLength={80} {...numberProps} />}
        </Field>
      ) : null}
    </div>
  );
}
