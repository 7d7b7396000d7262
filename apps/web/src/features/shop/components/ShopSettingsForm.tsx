import { ScaleResolutionG, UpdateShopRequest, type Shop } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateShop } from '../api/update-shop';

// Radio inputs hand over strings; the scale resolution travels as a number.
const SettingsFields = UpdateShopRequest.required().extend({
  scaleResolutionG: z.enum(['0.1', '1'], { message: 'choose a scale resolution' }).transform(Number).pipe(ScaleResolutionG),
  offRatioTolerancePct: z
    .string()
    .trim()
    .min(1, { message: 'the off-ratio tolerance is required' })
    .transform(Number)
    .pipe(UpdateShopRequest.shape.offRatioTolerancePct.unwrap()),
});
type SettingsInput = z.input<typeof SettingsFields>;
type SettingsValues = z.output<typeof SettingsFields>;
const fieldNames = ['name', 'unitSystem', 'scaleResolutionG', 'offRatioTolerancePct'] as const;

const unitChoices = [
  { value: 'metric', label: 'Metric', hint: 'millimetres, millilitres, grams' },
  { value: 'us', label: 'US customary', hint: 'inches, fluid ounces, ounces' },
] as const;

const scaleChoices = [
  { value: '0.1', label: '0.1 g', hint: 'the scale reads tenths of a gram' },
  { value: '1', label: '1 g', hint: 'the scale reads whole grams' },
] as const;

export function ShopSettingsForm({ shop, onSaved }: { shop: Shop; onSaved?: (shop: Shop) => unknown }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<SettingsInput, unknown, SettingsValues>({
    resolver: zodResolver(SettingsFields),
    defaultValues: {
      name: shop.name,
      unitSystem: shop.unitSystem,
      scaleResolutionG: shop.scaleResolutionG === 0.1 ? '0.1' : '1',
      offRatioTolerancePct: String(shop.offRatioTolerancePct),
    },
  });
  const update = useUpdateShop({ onSuccess: onSaved });
  const { errors, isDirty } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      const updated = await update.mutateAsync(values);
      form.reset({
        name: updated.name,
        unitSystem: updated.unitSystem,
        scaleResolutionG: updated.scaleResolutionG === 0.1 ? '0.1' : '1',
        offRatioTolerancePct: String(updated.offRatioTolerancePct),
      });
      setSaved(true);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-6" aria-label="Shop settings">
      <FormAlert message={formError} title="Could not save the settings" />
      {saved && !isDirty ? <Alert tone="success">Settings saved. New pour plans and run sheets use them from now on.</Alert> : null}
      <Field label="Shop name" error={errors.name?.message} required>
        {(control) => <Input {...control} maxLength={120} autoComplete="organization" {...form.register('name')} />}
      </Field>
      <ChoiceGroup legend="Units on screen and on run sheets" choices={unitChoices} error={errors.unitSystem?.message} inputProps={form.register('unitSystem')} />
      <ChoiceGroup
        legend="Scale resolution"
        choices={scaleChoices}
        error={errors.scaleResolutionG?.message}
        inputProps={form.register('scaleResolutionG')}
      />
      <Field
        label="Off-ratio tolerance (%)"
        hint="A batch whose weighed A:B differs from the run sheet by more than this is flagged when it is logged."
        error={errors.offRatioTolerancePct?.message}
        required
      >
        {(control) => <Input {...control} inputMode="decimal" {...form.register('offRatioTolerancePct')} />}
      </Field>
      <div>
        <Button type="submit" busy={update.isPending} busyLabel="Saving…">
          Save settings
        </Button>
      </div>
    </form>
  );
}
