import { formatTemperature, plausibleRange, temperatureConcerns, type UnitSystem } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { UnusualValueQuestion } from '../../../components/ui/UnusualValueQuestion';
import { isApiError } from '../../../lib/api-error';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAddReading } from '../api/add-readings';
import { toLocalInput } from '../utils/local-time';
import { readingFormSchema, type ReadingFormInput, type ReadingFormValues } from '../utils/reading-form';
import { inputUnitsOf, temperatureFromC } from '../utils/shop-units';

const fieldNames = ['at', 'temp'] as const;

interface Question {
  message: string;
  values: ReadingFormValues;
  suggestedTempC?: number | undefined;
}

export interface AddReadingFormProps {
  pourId: string;
  unitSystem: UnitSystem;
  /** The working range of the product curing now: readings far outside it are questioned before they are kept. */
  product: { minWorkTempC: number; maxWorkTempC: number };
}

/** One reading off the shop thermometer; an unusual one is questioned (°F typed as °C, far out of range). */
export function AddReadingForm({ pourId, unitSystem, product }: AddReadingFormProps) {
  const schema = useMemo(() => readingFormSchema(unitSystem), [unitSystem]);
  const form = useForm<ReadingFormInput, unknown, ReadingFormValues>({
    resolver: zodResolver(schema),
    defaultValues: { at: toLocalInput(new Date()), temp: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [question, setQuestion] = useState<Question | null>(null);
  const add = useAddReading(pourId);
  const unit = inputUnitsOf(unitSystem).temperature;

  const save = async (values: ReadingFormValues, confirmUnusual: boolean) => {
    setFormError(null);
    try {
      await add.mutateAsync({ reading: { at: values.at, tempC: values.temp }, confirmUnusual });
      setQuestion(null);
      form.reset({ at: toLocalInput(new Date()), temp: '' });
    } catch (error) {
      if (isApiError(error) && error.code === 'confirmation_needed') setQuestion({ message: error.message, values });
      else setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  };

  const onSubmit = form.handleSubmit(async (values) => {
    // The same question the API asks, asked before anything is sent.
    const [concern] = temperatureConcerns(values.temp, plausibleRange(product));
    if (concern) {
      setQuestion({ message: concern.message, values, suggestedTempC: concern.suggestedTempC });
      return;
    }
    await save(values, false);
  });

  const shown = (tempC: number) => formatTemperature(tempC, unitSystem).text;
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a temperature reading" className="flex flex-col gap-4">
      <FormAlert message={formError} title="The reading was not saved" />
      {question ? (
        <UnusualValueQuestion
          message={question.message}
          confirmLabel={`Log ${shown(question.values.temp)} as it is`}
          busy={add.isPending}
          onConfirm={() => void save(question.values, true)}
          suggestion={
            question.suggestedTempC === undefined
              ? undefined
              : {
                  label: `It was °F: use ${shown(question.suggestedTempC)}`,
                  apply: () => {
                    form.setValue('temp', String(Math.round(temperatureFromC(question.suggestedTempC!, unitSystem) * 10) / 10), { shouldDirty: true });
                    setQuestion(null);
                  },
                }
          }
        />
      ) : null}
      {add.isSuccess && !form.formState.isDirty && !question ? (
        add.data.queued ? (
          <Alert tone="info">Reading kept on this phone; it is sent when the connection returns.</Alert>
        ) : (
          <Alert tone="success">{add.data.added.duplicates > 0 ? 'A reading at that time was already logged; nothing changed.' : 'Reading saved.'}</Alert>
        )
      ) : null}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] sm:items-end">
        <Field label="Time of reading" error={errors.at?.message} required>
          {(control) => <Input {...control} type="datetime-local" className="min-h-12!" {...form.register('at')} />}
        </Field>
        <Field label={`Temperature (${unit})`} error={errors.temp?.message} required>
          {(control) => (
            <Input
              {...control}
              inputMode="decimal"
              autoComplete="off"
              className="min-h-12! text-xl tabular-nums"
              {...form.register('temp', { onChange: () => setQuestion(null) })}
            />
          )}
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
