import { ScaleResolutionG, UpdateShopRequest, type Shop } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { applyServerErrors } from '../../../lib/form-errors';
import { requiredNumber } from '../../../lib/form-input';
import { useUpdateShop } from '../api/update-shop';
import { currencyOptions } from '../utils/currency-options';

/** A typed number read as core reads every number, then checked by the contract's own rule and sentence. */
const typedNumber = <T extends z.ZodType<number, number>>(rule: T, missing: string) => z.string().trim().min(1, { message: missing }).transform(requiredNumber).pipe(rule);

// Radio inputs hand over strings; the scale resolution travels as a number.
const SettingsFields = UpdateShopRequest.required().extend({
  scaleResolutionG: z.enum(['0.1', '1'], { message: 'choose a scale resolution' }).transform(Number).pipe(ScaleResolutionG),
  offRatioTolerancePct: typedNumber(UpdateShopRequest.shape.offRatioTolerancePct.unwrap(), 'the off-ratio tolerance is required'),
  readingCarryH: typedNumber(UpdateShopRequest.shape.readingCarryH.unwrap(), 'how long a reading speaks for is required'),
  windowCloseLeadMin: typedNumber(UpdateShopRequest.shape.windowCloseLeadMin.unwrap(), 'the warning before a window closes is required'),
});
type SettingsInput = z.input<typeof SettingsFields>;
type SettingsValues = z.output<typeof SettingsFields>;
const fieldNames = ['name', 'unitSystem', 'scaleResolutionG', 'offRatioTolerancePct', 'readingCarryH', 'windowCloseLeadMin', 'currency'] as const;

const formValuesOf = (shop: Shop): SettingsInput => ({
  name: shop.name,
  unitSystem: shop.unitSystem,
  scaleResolutionG: shop.scaleResolutionG === 0.1 ? '0.1' : '1',
  offRatioTolerancePct: String(shop.offRatioTolerancePct),
  readingCarryH: String(shop.readingCarryH),
  windowCloseLeadMin: String(shop.windowCloseLeadMin),
  currency: shop.currency,
});

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
    defaultValues: formValuesOf(shop),
  });
  const update = useUpdateShop({ onSuccess: onSaved });
  const currencies = useMemo(() => currencyOptions(shop.currency), [shop.currency]);
  const { errors, isDirty } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      const updated = await update.mutateAsync(values);
      form.reset(formValuesOf(updated));
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
        hint="A batch whose weighed A:B differs from the product's ratio by more than this is flagged when it is logged, and a run-sheet cup that rounding to the scale leaves further off says so."
        error={errors.offRatioTolerancePct?.message}
        required
      >
        {(control) => <Input {...control} inputMode="decimal" {...form.register('offRatioTolerancePct')} />}
      </Field>
      <Field
        label="How long one temperature reading speaks for (h)"
        hint="In the cure sum a reading covers this long on either side of it. A longer stretch without readings is a gap: it is counted at the lower of the readings around it and the plan's shop temperature, and shown on the cure log."
        error={errors.readingCarryH?.message}
        required
      >
        {(control) => <Input {...control} inputMode="decimal" {...form.register('readingCarryH')} />}
      </Field>
      <Field
        label="Warn before a pour window closes (min)"
        hint="Reminders that a seal coat's or layer's pour window closes go out this long before it does."
        error={errors.windowCloseLeadMin?.message}
        required
      >
        {(control) => <Input {...control} inputMode="numeric" {...form.register('windowCloseLeadMin')} />}
      </Field>
      <Field label="Currency" hint="Prices on the shelf and the costs of pour plans and run sheets are in this currency." error={errors.currency?.message} required>
        {(control) => <Select {...control} options={currencies} {...form.register('currency')} />}
      </Field>
      <div>
        <Button type="submit" busy={update.isPending} busyLabel="Saving…">
          Save settings
        </Button>
      </div>
    </form>
  );
}
