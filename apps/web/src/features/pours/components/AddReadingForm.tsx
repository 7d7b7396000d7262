import type { UnitSystem } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAddReading } from '../api/add-readings';
import { toLocalInput } from '../utils/local-time';
import { readingFormSchema, type ReadingFormInput, type ReadingFormValues } from '../utils/reading-form';
import { inputUnitsOf } from '../utils/shop-units';

const fieldNames = ['at', 'temp'] as const;

/** One reading off the shop thermometer. */
export function AddReadingForm({ pourId, unitSystem }: { pourId: string; unitSystem: UnitSystem }) {
  const schema = useMemo(() => readingFormSchema(unitSystem), [unitSystem]);
  const form = useForm<ReadingFormInput, unknown, ReadingFormValues>({ resolver: zodResolver(schema), defaultValues: { at: toLocalInput(new Date()), temp: '' } });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const add = useAddReading(pourId);
  const unit = inputUnitsOf(unitSystem).temperature;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await add.mutateAsync({ at: values.at, tempC: values.temp });
      form.reset({ at: toLocalInput(new Date()), temp: '' });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a temperature reading" className="flex flex-col gap-4">
      <FormAlert message={formError} title="The reading was not saved" />
      {add.isSuccess && !form.formState.isDirty ? (
        <Alert tone="success">{add.data.duplicates > 0 ? 'A reading at that time was already logged; nothing changed.' : 'Reading saved.'}</Alert>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] sm:items-end">
        <Field label="Time of reading" error={errors.at?.message} required>
          {(control) => <Input {...control} type="datetime-local" className="min-h-12!" {...form.register('at')} />}
        </Field>
        <Field label={`Temperature (${unit})`} error={errors.temp?.message} required>
          {(control) => <Input {...control} inputMode="decimal" autoComplete="off" className="min-h-12! text-xl tabular-nums" {...form.register('temp')} />}
        </Field>
        <div>
          <Button type="submit" className="min-h-12!" busy={add.isPending} busyLabel="Saving…">
            Add reading
          </Button>
        </div>
      </div>
    </form>
  );
}
