import { ScaleResolutionG, ShopTemperatureProfile, UpdateShopRequest, type Shop } from '@gelpoint/contracts';
import { convertTemperature, unitSystemUnits } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
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
const typedNumber = <T extends z.ZodType<number, number>>(rule: T, missing: string) =>
  z.string().trim().min(1, { message: missing }).transform(requiredNumber).pipe(rule);

const hourText = (label: string) => typedNumber(UpdateShopRequest.shape.dayStartHour.unwrap(), `${label} is required`);

// Radio inputs and boxes hand over strings; the request carries numbers and the profile as one object.
const SettingsFields = UpdateShopRequest.required()
  .omit({ temperatureProfile: true })
  .extend({
    scaleResolutionG: z.enum(['0.1', '1'], { message: 'choose a scale resolution' }).transform(Number).pipe(ScaleResolutionG),
    offRatioTolerancePct: typedNumber(UpdateShopRequest.shape.offRatioTolerancePct.unwrap(), 'the off-ratio tolerance is required'),
    readingCarryH: typedNumber(UpdateShopRequest.shape.readingCarryH.unwrap(), 'how long a reading speaks for is required'),
    windowCloseLeadMin: typedNumber(UpdateShopRequest.shape.windowCloseLeadMin.unwrap(), 'the warning before a window closes is required'),
    dayStartHour: hourText('the hour the working day starts'),
    quietFromHour: hourText('the hour quiet hours start'),
    profileMode: z.enum(['plan', 'day_night', 'learned'], { message: 'choose how the shop’s temperature is taken where nothing is logged' }),
    dayTemp: z.string(),
    nightTemp: z.string(),
    profileDayStart: z.string(),
    profileNightStart: z.string(),
  })
  .transform((v, ctx) => {
    const { profileMode, dayTemp, nightTemp, profileDayStart, profileNightStart, ...rest } = v;
    if (profileMode !== 'day_night') return { ...rest, temperatureProfile: { mode: profileMode } as const };
    const toC = (text: string) => {
      const n = requiredNumber(text);
      return rest.unitSystem === 'us' && Number.isFinite(n) ? convertTemperature(n, 'F', 'C') : n;
    };
    const parsed = ShopTemperatureProfile.safeParse({
      mode: 'day_night',
      dayTempC: toC(dayTemp),
      nightTempC: toC(nightTemp),
      dayStartHour: requiredNumber(profileDayStart),
      nightStartHour: requiredNumber(profileNightStart),
    });
    if (!parsed.success) {
      const fieldOf: Record<string, string> = {
        dayTempC: 'dayTemp',
        nightTempC: 'nightTemp',
        dayStartHour: 'profileDayStart',
        nightStartHour: 'profileNightStart',
      };
      for (const issue of parsed.error.issues)
        ctx.addIssue({ code: 'custom', message: issue.message, path: [fieldOf[String(issue.path[0])] ?? 'profileMode'] });
      return z.NEVER;
    }
    return { ...rest, temperatureProfile: parsed.data };
  });
type SettingsInput = z.input<typeof SettingsFields>;
type SettingsValues = z.output<typeof SettingsFields>;
const fieldNames = [
  'name',
  'unitSystem',
  'scaleResolutionG',
  'offRatioTolerancePct',
  'readingCarryH',
  'windowCloseLeadMin',
  'currency',
  'timeZone',
  'dayStartHour',
  'quietFromHour',
  'profileMode',
  'dayTemp',
  'nightTemp',
  'profileDayStart',
  'profileNightStart',
] as const;

const shownTemp = (tempC: number, unitSystem: Shop['unitSystem']) =>
  String(Math.round((unitSystem === 'us' ? convertTemperature(tempC, 'C', 'F') : tempC) * 10) / 10);

const formValuesOf = (shop: Shop): SettingsInput => {
  const profile = shop.temperatureProfile;
  const dayNight = profile.mode === 'day_night' ? profile : null;
  return {
    name: shop.name,
    unitSystem: shop.unitSystem,
    scaleResolutionG: shop.scaleResolutionG === 0.1 ? '0.1' : '1',
    offRatioTolerancePct: String(shop.offRatioTolerancePct),
    readingCarryH: String(shop.readingCarryH),
    windowCloseLeadMin: String(shop.windowCloseLeadMin),
    currency: shop.currency,
    timeZone: shop.timeZone,
    dayStartHour: String(shop.dayStartHour),
    quietFromHour: String(shop.quietFromHour),
    profileMode: profile.mode,
    dayTemp: dayNight ? shownTemp(dayNight.dayTempC, shop.unitSystem) : '',
    nightTemp: dayNight ? shownTemp(dayNight.nightTempC, shop.unitSystem) : '',
    profileDayStart: dayNight ? String(dayNight.dayStartHour) : '8',
    profileNightStart: dayNight ? String(dayNight.nightStartHour) : '20',
  };
};

/** Every IANA zone the browser knows, with the shop's own first if the list lacks it. */
function zoneOptions(current: string): { value: string; label: string }[] {
  const zones = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  const all = zones.includes(current) ? zones : [current, ...zones];
  return all.map((z) => ({ value: z, label: z.replaceAll('_', ' ') }));
}

const profileChoices = [
  { value: 'plan', label: 'The plan’s shop temperature', hint: 'one temperature all day, typed into each plan' },
  { value: 'day_night', label: 'Day and night', hint: 'a day and a night temperature, changing at the hours you set' },
  { value: 'learned', label: 'Learn from the last 7 days', hint: 'each hour of the day as this shop’s readings showed it' },
] as const;

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
  const [profileMode, unitSystem] = useWatch({ control: form.control, name: ['profileMode', 'unitSystem'] });
  const tempUnit = unitSystemUnits[unitSystem].temperature.symbol;

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
      <ChoiceGroup
        legend="Units on screen and on run sheets"
        choices={unitChoices}
        error={errors.unitSystem?.message}
        inputProps={form.register('unitSystem')}
      />
      <ChoiceGroup legend="Scale resolution" choices={scaleChoices} error={errors.scaleResolutionG?.message} inputProps={form.register('scaleResolutionG')} />
      <Field
        label="Off-ratio tolerance (%)"
        hint="A batch whose weighed A:B differs from the product's ratio by more than this is flagged when it is logged, and a run-sheet cup that rounding to the scale leaves further off says so."
        error={errors.offRatioTolerancePct?.message}
        required
      >
        {(control) => <Input {...control} inputMode="decimal" {...form.register('offRatioTolerancePct')} />}
      </Field>
      <Field label="Time zone" hint="Every time Gelpoint shows or mails is in this zone, with its abbreviation." error={errors.timeZone?.message} required>
        {(control) => <Select {...control} options={zoneOptions(shop.timeZone)} {...form.register('timeZone')} />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Working day starts (hour, 0–23)" hint="The morning digest goes out then; quiet hours end." error={errors.dayStartHour?.message} required>
          {(control) => <Input {...control} inputMode="numeric" {...form.register('dayStartHour')} />}
        </Field>
        <Field
          label="Quiet hours start (hour, 0–23)"
          hint="Reminders due in the night wait for the morning digest."
          error={errors.quietFromHour?.message}
          required
        >
          {(control) => <Input {...control} inputMode="numeric" {...form.register('quietFromHour')} />}
        </Field>
      </div>
      <ChoiceGroup
        legend="The shop’s temperature where nothing is logged"
        choices={profileChoices}
        error={errors.profileMode?.message}
        inputProps={form.register('profileMode')}
      />
      {profileMode === 'day_night' ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label={`Day temperature (${tempUnit})`} error={errors.dayTemp?.message} required>
            {(control) => <Input {...control} inputMode="decimal" {...form.register('dayTemp')} />}
          </Field>
          <Field label="Day starts (hour, 0–23)" error={errors.profileDayStart?.message} required>
            {(control) => <Input {...control} inputMode="numeric" {...form.register('profileDayStart')} />}
          </Field>
          <Field label={`Night temperature (${tempUnit})`} error={errors.nightTemp?.message} required>
            {(control) => <Input {...control} inputMode="decimal" {...form.register('nightTemp')} />}
          </Field>
          <Field label="Night starts (hour, 0–23)" error={errors.profileNightStart?.message} required>
            {(control) => <Input {...control} inputMode="numeric" {...form.register('profileNightStart')} />}
          </Field>
        </div>
      ) : null}
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
      <Field
        label="Currency"
        hint="Prices on the shelf and the costs of pour plans and run sheets are in this currency."
        error={errors.currency?.message}
        required
      >
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
