import { PigmentInput, PigmentKind, type PigmentView } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, type FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { useProductForm } from '../hooks/use-product-form';
import { newPigmentDefaults, pigmentInputOf } from '../utils/form-defaults';
import { pigmentKindWords } from '../utils/shelf-words';
import { FormSection } from './FormSection';
import { ProductForm } from './ProductForm';

type FormInput = z.input<typeof PigmentInput>;
type FormOutput = z.output<typeof PigmentInput>;

const kindOptions = PigmentKind.options.map((kind) => ({ value: kind, label: pigmentKindWords[kind] }));
const fieldNames: readonly FieldPath<FormInput>[] = ['name', 'kind', 'densityGPerMl', 'recommendedPct', 'maxPct', 'pricePerPack', 'packSizeG'];

export interface PigmentFormProps {
  pigment?: PigmentView;
  submitLabel: string;
  busyLabel: string;
  busy: boolean;
  save: (values: FormOutput) => Promise<unknown>;
}

export function PigmentForm({ pigment, submitLabel, busyLabel, busy, save }: PigmentFormProps) {
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(PigmentInput),
    defaultValues: pigment ? pigmentInputOf(pigment) : newPigmentDefaults,
  });
  const { errors } = form.formState;
  const { formError, onSubmit, number } = useProductForm(form, fieldNames, save);

  return (
    <ProductForm
      label={pigment ? `Edit ${pigment.name}` : 'New pigment'}
      errorTitle="Could not save the pigment"
      formError={formError}
      onSubmit={onSubmit}
      submitLabel={submitLabel}
      busyLabel={busyLabel}
      busy={busy}
    >
      <FormSection legend="Pigment">
        <Field label="Name" error={errors.name?.message} required>
          {(control) => <Input {...control} maxLength={120} {...form.register('name')} />}
        </Field>
        <Field label="Kind" error={errors.kind?.message} required>
          {(control) => <Select {...control} options={kindOptions} {...form.register('kind')} />}
        </Field>
        <Field
          label="Density (g/mL)"
          hint="From its data sheet: the pigment takes room in the mould too, so its volume counts in the pour. Liquid colourants are near 1, pastes a little more, mica powders near 2.8."
          error={errors.densityGPerMl?.message}
          required
        >
          {(control) => <Input {...control} inputMode="decimal" {...number('densityGPerMl')} />}
        </Field>
      </FormSection>
      <FormSection legend="Loading" hint="Pigment is weighed as a percentage of part A + part B by mass.">
        <Field label="Recommended loading (% of part A + part B by mass)" error={errors.recommendedPct?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('recommendedPct')} />}
        </Field>
        <Field label="Maximum loading (% of part A + part B by mass)" hint="Above this the resin may not cure fully." error={errors.maxPct?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('maxPct')} />}
        </Field>
      </FormSection>
      <FormSection legend="Price">
        <Field label="Price per pack (shop currency)" error={errors.pricePerPack?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('pricePerPack')} />}
        </Field>
        <Field label="Pack size (g)" error={errors.packSizeG?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('packSizeG')} />}
        </Field>
      </FormSection>
    </ProductForm>
  );
}
