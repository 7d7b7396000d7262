import { LotUpdate, type LotView } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Textarea } from '../../../components/ui/Textarea';
import { applyServerErrors } from '../../../lib/form-errors';
import { lotEditValuesOf } from '../utils/form-defaults';
import { optionalText, requiredNumber } from '../../../lib/form-input';

type FormInput = z.input<typeof LotUpdate>;
type FormOutput = z.output<typeof LotUpdate>;
const fieldNames: readonly FieldPath<FormInput>[] = ['lotNumber', 'remainingG', 'expiresOn', 'notes'];

export interface LotEditFormProps {
  lot: LotView;
  busy: boolean;
  save: (changes: FormOutput) => Promise<unknown>;
}

/** Corrections to a lot: its number, what is really left after a stock count, its expiry and notes. */
export function LotEditForm({ lot, busy, save }: LotEditFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(LotUpdate), defaultValues: lotEditValuesOf(lot) });
  const { errors, isDirty } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      await save(values);
      form.reset(values);
      setSaved(true);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label={`Correct lot ${lot.lotNumber}`}>
      <FormAlert message={formError} title="Could not save the lot" />
      {saved && !isDirty ? <Alert tone="success">Saved.</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Lot number" error={errors.lotNumber?.message} required>
          {(control) => <Input {...control} maxLength={80} {...form.register('lotNumber')} />}
        </Field>
        <Field label="Left on the shelf (g)" hint={`At most the ${lot.quantityG} g received.`} error={errors.remainingG?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...form.register('remainingG', { setValueAs: requiredNumber })} />}
        </Field>
        <Field label="Expires on" hint="Leave empty when the label gives no date." error={errors.expiresOn?.message}>
          {(control) => <Input {...control} type="date" {...form.register('expiresOn', { setValueAs: optionalText })} />}
        </Field>
      </div>
      <Field label="Notes" error={errors.notes?.message}>
        {(control) => <Textarea {...control} rows={3} maxLength={1000} {...form.register('notes')} />}
      </Field>
      <div>
        <Button type="submit" busy={busy} busyLabel="Saving…">
          Save corrections
        </Button>
      </div>
    </form>
  );
}
