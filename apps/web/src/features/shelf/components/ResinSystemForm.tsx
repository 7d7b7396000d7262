import { ResinSystemInput, ResinUse, type ResinSystemView } from '@gelpoint/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';
import { Field } from '../../../components/ui/Field';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { useProductForm } from '../hooks/use-product-form';
import { exothermDefaults } from '@gelpoint/core';
import { activationEnergyUsed } from '../utils/activation-energy';
import { newResinSystemDefaults, resinSystemInputOf } from '../utils/form-defaults';
import { optionalNumber, requiredNumber } from '../../../lib/form-input';
import { ratioBasisWords, resinUseWords } from '../utils/shelf-words';
import { FormSection } from './FormSection';
import { ProductForm } from './ProductForm';

type FormInput = z.input<typeof ResinSystemInput>;
type FormOutput = z.output<typeof ResinSystemInput>;

const useOptions = ResinUse.options.map((use) => ({ value: use, label: resinUseWords[use] }));
const basisChoices = [
  { value: 'weight', label: `Parts ${ratioBasisWords.weight}`, hint: 'the data sheet gives grams of A to grams of B' },
  { value: 'volume', label: `Parts ${ratioBasisWords.volume}`, hint: 'the data sheet gives millilitres of A to millilitres of B' },
];

const fieldNames: readonly FieldPath<FormInput>[] = [
  'name',
  'maker',
  'use',
  'mixRatio.a',
  'mixRatio.b',
  'mixRatio.basis',
  'densityAGPerMl',
  'densityBGPerMl',
  'potLifeMin',
  'gelTimeH',
  'tackFreeH',
  'recoatWindow',
  'recoatWindow.earliestH',
  'recoatWindow.latestH',
  'demoldH',
  'fullCureH',
  'readyToMachineH',
  'referenceTempC',
  'minWorkTempC',
  'maxWorkTempC',
  'maxLayerMm',
  'maxBatchG',
  'activationEnergyKJPerMol',
  'hardnessShoreD',
  'reactionHeatJPerG',
  'thinFilmGelMin',
  'heatCapacityJPerGK',
  'conductivityWPerMK',
  'acceptedPeakC',
  'pricePerKit',
  'kitSizeG',
  'shelfLifeMonths',
];

export interface ResinSystemFormProps {
  resinSystem?: ResinSystemView;
  submitLabel: string;
  busyLabel: string;
  busy: boolean;
  save: (values: FormOutput) => Promise<unknown>;
}

/** The data sheet of a resin system, grouped as a TDS groups it; every label carries its unit. */
export function ResinSystemForm({ resinSystem, submitLabel, busyLabel, busy, save }: ResinSystemFormProps) {
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(ResinSystemInput),
    defaultValues: resinSystem ? resinSystemInputOf(resinSystem) : newResinSystemDefaults,
  });
  const { errors } = form.formState;
  const [referenceTempC, typedEnergy] = useWatch({ control: form.control, name: ['referenceTempC', 'activationEnergyKJPerMol'] });
  const energy = activationEnergyUsed(optionalNumber(typedEnergy), requiredNumber(referenceTempC));
  const { formError, onSubmit, number, optional } = useProductForm(form, fieldNames, save);

  return (
    <ProductForm
      label={resinSystem ? `Edit ${resinSystem.name}` : 'New resin system'}
      errorTitle="Could not save the resin system"
      formError={formError}
      onSubmit={onSubmit}
      submitLabel={submitLabel}
      busyLabel={busyLabel}
      busy={busy}
    >
      <FormSection legend="Product">
        <Field label="Name" hint="As printed on the kit." error={errors.name?.message} required>
          {(control) => <Input {...control} maxLength={120} {...form.register('name')} />}
        </Field>
        <Field label="Maker" error={errors.maker?.message}>
          {(control) => <Input {...control} maxLength={120} {...form.register('maker')} />}
        </Field>
        <Field label="Use" error={errors.use?.message} required>
          {(control) => <Select {...control} options={useOptions} {...form.register('use')} />}
        </Field>
        <Field label="Shelf life (months)" error={errors.shelfLifeMonths?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('shelfLifeMonths')} />}
        </Field>
      </FormSection>

      <FormSection legend="Mix" hint="The ratio exactly as the data sheet states it; the densities turn it into grams of each part.">
        <Field label="Mix ratio, part A (parts)" error={errors.mixRatio?.a?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('mixRatio.a')} />}
        </Field>
        <Field label="Mix ratio, part B (parts)" error={errors.mixRatio?.b?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('mixRatio.b')} />}
        </Field>
        <div className="sm:col-span-2">
          <ChoiceGroup
            legend="The ratio is stated"
            choices={basisChoices}
            error={errors.mixRatio?.basis?.message}
            inputProps={form.register('mixRatio.basis')}
          />
        </div>
        <Field label="Density of part A (g/mL)" hint="Liquid epoxy resin is typically about 1.1 to 1.2." error={errors.densityAGPerMl?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('densityAGPerMl')} />}
        </Field>
        <Field label="Density of part B (g/mL)" hint="Amine hardeners are typically about 0.9 to 1.05." error={errors.densityBGPerMl?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('densityBGPerMl')} />}
        </Field>
      </FormSection>

      <FormSection legend="Times at the reference temperature" hint="Gelpoint stretches or shortens these for the shop's temperature.">
        <Field label="Reference temperature (°C)" hint="The temperature the data sheet's times are given at." error={errors.referenceTempC?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('referenceTempC')} />}
        </Field>
        <Field label="Pot life (min)" error={errors.potLifeMin?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('potLifeMin')} />}
        </Field>
        <Field label="Gel time (h)" error={errors.gelTimeH?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('gelTimeH')} />}
        </Field>
        <Field label="Tack-free (h)" error={errors.tackFreeH?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('tackFreeH')} />}
        </Field>
        <Field label="Recoat window opens (h)" hint="Earliest time to pour the next layer." error={errors.recoatWindow?.earliestH?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('recoatWindow.earliestH')} />}
        </Field>
        <Field
          label="Recoat window closes (h)"
          hint="After this the layer needs sanding before the next pour."
          error={errors.recoatWindow?.latestH?.message ?? errors.recoatWindow?.message}
          required
        >
          {(control) => <Input {...control} inputMode="decimal" {...number('recoatWindow.latestH')} />}
        </Field>
        <Field label="Demold (h)" error={errors.demoldH?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('demoldH')} />}
        </Field>
        <Field label="Full cure (h)" error={errors.fullCureH?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('fullCureH')} />}
        </Field>
        <Field label="Ready to machine (h)" hint="Leave empty when the data sheet says to wait for full cure." error={errors.readyToMachineH?.message}>
          {(control) => <Input {...control} inputMode="decimal" {...optional('readyToMachineH')} />}
        </Field>
        <Field
          label="Cured hardness (Shore D)"
          hint="When the data sheet states one, a piece is released for machining only after a cure check measured at least this. Leave empty otherwise."
          error={errors.hardnessShoreD?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('hardnessShoreD')} />}
        </Field>
        <Field
          label="Activation energy (kJ/mol)"
          hint={
            <>
              Few data sheets give one. Leave it empty to use the common-practice rule that the cure rate doubles for every 10 °C warmer.{' '}
              <span aria-live="polite" className="font-semibold text-ink">
                {energy
                  ? `Value used: ${energy.valueKJPerMol.toFixed(1)} kJ/mol (${energy.fromDataSheet ? 'from the data sheet' : 'the common-practice default'}).`
                  : 'Enter the reference temperature to see the value used.'}
              </span>
            </>
          }
          error={errors.activationEnergyKJPerMol?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('activationEnergyKJPerMol')} />}
        </Field>
      </FormSection>

      <FormSection legend="Limits" hint="The exotherm limits decide how many layers and batches a pour needs.">
        <Field label="Maximum layer (mm)" hint="Thickest layer the product allows in one pour." error={errors.maxLayerMm?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('maxLayerMm')} />}
        </Field>
        <Field label="Maximum batch (g)" hint="Heaviest cup of A + B the product allows mixed at once." error={errors.maxBatchG?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('maxBatchG')} />}
        </Field>
        <Field label="Minimum working temperature (°C)" error={errors.minWorkTempC?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('minWorkTempC')} />}
        </Field>
        <Field label="Maximum working temperature (°C)" error={errors.maxWorkTempC?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('maxWorkTempC')} />}
        </Field>
      </FormSection>

      <FormSection
        legend="Exotherm forecast"
        hint="What the heat forecast needs. Leave a field empty to use the default named under it; the forecast is calibrated so the maximum layer above, poured at the reference temperature, peaks at the accepted peak."
      >
        <Field
          label="Heat of reaction (J/g)"
          hint={`From a DSC measurement of the mixed product. Empty: ${exothermDefaults.reactionHeatJPerG} J/g, a published value for bisphenol-A epoxy with an amine hardener.`}
          error={errors.reactionHeatJPerG?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('reactionHeatJPerG')} />}
        </Field>
        <Field
          label="Thin-film gel time (min)"
          hint="How long a thin film takes to gel at the reference temperature. Empty: the gel time above (a cup gels sooner than a film, so that errs hot)."
          error={errors.thinFilmGelMin?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('thinFilmGelMin')} />}
        </Field>
        <Field
          label="Heat capacity (J/(g·K))"
          hint={`Empty: ${exothermDefaults.heatCapacityJPerGK} J/(g·K), typical of published cure models for epoxy.`}
          error={errors.heatCapacityJPerGK?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('heatCapacityJPerGK')} />}
        </Field>
        <Field
          label="Thermal conductivity (W/(m·K))"
          hint={`Empty: ${exothermDefaults.conductivityWPerMK} W/(m·K), typical of unfilled plastics.`}
          error={errors.conductivityWPerMK?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('conductivityWPerMK')} />}
        </Field>
        <Field
          label="Accepted peak temperature (°C)"
          hint={`The hottest the shop lets a layer get. Empty: ${exothermDefaults.acceptedPeakC} °C, a starting value to replace with the shop's own.`}
          error={errors.acceptedPeakC?.message}
        >
          {(control) => <Input {...control} inputMode="decimal" {...optional('acceptedPeakC')} />}
        </Field>
      </FormSection>

      <FormSection legend="Price">
        <Field label="Price per kit (shop currency)" error={errors.pricePerKit?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('pricePerKit')} />}
        </Field>
        <Field label="Kit size, A + B together (g)" error={errors.kitSizeG?.message} required>
          {(control) => <Input {...control} inputMode="decimal" {...number('kitSizeG')} />}
        </Field>
      </FormSection>
    </ProductForm>
  );
}
