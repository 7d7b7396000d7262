import { LotInput, type PigmentView, type ResinSystemView } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { Textarea } from '../../../components/ui/Textarea';
import { applyServerErrors } from '../../../lib/form-errors';
import { todayIsoDate } from '../utils/calendar-date';
import { lotParts } from '../utils/lot-parts';
import { optionalText, requiredNumber } from '../../../lib/form-input';
import { lotPartWords } from '../utils/shelf-words';
import { FormSection } from './FormSection';

type FormInput = z.input<typeof LotInput>;
type FormOutput = z.output<typeof LotInput>;

const partOptions = lotParts.map((part) => ({ value: part, label: lotPartWords[part] }));
const fieldNames: readonly FieldPath<FormInput>[] = ['part', 'resinSystemId', 'pigmentId', 'lotNumber', 'quantityG', 'receivedOn', 'expiresOn', 'notes'];

export interface LotFormProps {
  resinSystems: readonly ResinSystemView[];
  pigments: readonly PigmentView[];
  busy: boolean;
  save: (values: FormOutput) => Promise<unknown>;
}

/** Receiving a lot: which part of which product, its number from the label, how much came in and until when. */
export function LotForm({ resinSystems, pigments, busy, save }: LotFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(LotInput),
    defaultValues: { part: 'A', resinSystemId: null, pigmentId: null, lotNumber: '', receivedOn: todayIsoDate(), expiresOn: null, notes: '' },
  });
  const { errors } = form.formState;
  const part = useWatch({ control: form.control, name: 'part' });
  const forPigment = part === 'pigment';

  // A lot names one product: switching between a resin part and a pigment lets go of the other choice.
  useEffect(() => {
    form.setValue(forPigment ? 'resinSystemId' : 'pigmentId', null);
  }, [forPigment, form]);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await save(values);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  const products = forPigment
    ? pigments.filter((p) => !p.archived).map((p) => ({ value: p.id, label: p.name }))
    : resinSystems.filter((r) => !r.archived).map((r) => ({ value: r.id, label: r.name }));

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-6" aria-label="Receive a lot">
      <FormAlert message={formError} title="Could not save the lot" />
      <FormSection legend="What came in">
        <Field label="Part" error={errors.part?.message} required>
          {(control) => <Select {...control} options={partOptions} {...form.register('part')} />}
        </Field>
        {forPigment ? (
          <Field key="pigment" label="Pigment" error={errors.pigmentId?.message} required>
            {(control) => (
              <Select {...control} options={products} emptyOption="Choose the pigment" {...form.register('pigmentId', { setValueAs: optionalText })} />
            )}
          </Field>
        ) : (
          <Field key="resin" label="Resin system" error={errors.resinSystemId?.message} required>
            {(control) => (
              <Select {...control} options={products} emptyOption="Choose the resin system" {...form.register('resinSystemId', { setValueAs: optionalText })} />
            )}
          </Field>
        )}
        <Field label="Lot number" hint="As printed on the container." error={errors.lotNumber?.message} required>
          {(control) => <Input {...control} maxLength={80} {...form.register('lotNumber')} />}
        </Field>
        <Field label="Quantity received (g)" error={errors.quantityG?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...form.register('quantityG', { setValueAs: requiredNumber })} />}
        </Field>
      </FormSection>
      <FormSection legend="Dates">
        <Field label="Received on" error={errors.receivedOn?.message} required>
          {(control) => <Input {...control} type="date" {...form.register('receivedOn')} />}
        </Field>
        <Field label="Expires on" hint="Leave empty when the label gives no date." error={errors.expiresOn?.message}>
          {(control) => <Input {...control} type="date" {...form.register('expiresOn', { setValueAs: optionalText })} />}
        </Field>
      </FormSection>
      <Field label="Notes" error={errors.notes?.message}>
        {(control) => <Textarea {...control} rows={3} maxLength={1000} {...form.register('notes')} />}
      </Field>
      <div>
        <Button type="submit" busy={busy} busyLabel="Saving…">
          Add lot
        </Button>
      </div>
    </form>
  );
}
