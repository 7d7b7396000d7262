import type { PigmentView, ResinSystemView } from '@gelpoint/contracts';
import { formatLength, type UnitSystem } from '@gelpoint/core';
import { useEffect, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { ChoiceGroup } from '../../../components/ui/ChoiceGroup';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { DateTime } from '../../../components/ui/DateTime';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Select } from '../../../components/ui/Select';
import { hasStatus, isApiError } from '../../../lib/api-error';
import { errorNotice } from '../../../lib/error-notice';
import { useMold } from '../api/get-mold';
import { usePieceMolds } from '../api/get-piece-molds';
import { useLeaveGuard } from '../hooks/use-leave-guard';
import { useLivePlan } from '../hooks/use-live-plan';
import { usePlannerDraft } from '../hooks/use-planner-draft';
import { formDefaultsOf, valuesKey } from '../utils/form-defaults';
import type { DraftPlace } from '../utils/planner-draft';
import { optionalNumber, requiredNumber } from '../../../lib/form-input';
import {
  absorptionOptions,
  goneMoldWords,
  moldChoices,
  moldOptions,
  pigmentOptions,
  productOptions,
  shapeOptions,
  type ChosenMold,
} from '../utils/planner-options';
import { baseQuantity, shownPlannerValues, shownUnitNames, type PlannerUnits } from '../utils/planner-units';
import { fieldOfIssuePath, plannerResolver } from '../utils/planner-validation';
import type { PlannerValues, SavedPlanInput } from '../utils/planner-values';
import { LivePlanPanel, type RenderPlanMould3D } from './LivePlanPanel';
import { FieldGrid, PlannerSection, Switch } from './PlannerSection';

export interface PourPlannerProps {
  pieceId: string;
  /** In mm and °C, as the contract holds them; the form shows them in the shop's units. */
  initialValues: PlannerValues;
  resinSystems: readonly ResinSystemView[];
  pigments: readonly PigmentView[];
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code, for the plan's costs. */
  currency: string;
  scaleResolutionG: number;
  /** The shop's off-ratio tolerance: cups the scale cannot keep within it are cautioned. */
  offRatioTolerancePct: number;
  submitLabel: string;
  busy: boolean;
  save: (input: SavedPlanInput) => Promise<unknown>;
  /** Where the unsaved form is kept in this browser: the piece, and the plan (null for a new one). */
  draftPlace: DraftPlace;
  /** The saved plan's updatedAt the form opened from; null for a new plan. */
  basedOn: string | null;
  /** Draws the mould in 3D coloured by the live forecast, offered beside the map seen from above. */
  renderMould3D?: RenderPlanMould3D | undefined;
}

const sourceChoices = [
  { value: 'shape', label: 'A quick shape', hint: 'measure the cavity and enter it' },
  { value: 'mold', label: "The piece's mould", hint: 'from the cavity report of its mould file' },
];
const damChoices = [
  { value: 'outline', label: 'Dams along the outline', hint: 'resin only where the mould is' },
  { value: 'box', label: 'A box dam', hint: 'around the whole bounding box' },
];
function cupWasteUnits(unitSystem: UnitSystem) {
  const units = shownUnitNames(unitSystem);
  return [
    { value: 'g', label: `${units.mass} per cup` },
    { value: 'mL', label: `${units.volume} per cup` },
  ];
}

/** The maker's pour planner: inputs on one side, the plan they make on the other, recomputed as they type. */
export function PourPlanner({
  pieceId,
  initialValues,
  resinSystems,
  pigments,
  unitSystem,
  currency,
  scaleResolutionG,
  offRatioTolerancePct,
  submitLabel,
  busy,
  save,
  draftPlace,
  basedOn,
  renderMould3D,
}: PourPlannerProps) {
  const [formError, setFormError] = useState<string | null>(null);
  // The form is filled once, in the units of the shop as it was then; what it started from lets untouched values go back unchanged.
  const [units] = useState<PlannerUnits>(() => ({ unitSystem, origin: initialValues }));
  const [original] = useState(() => formDefaultsOf(shownPlannerValues(initialValues, units.unitSystem)) as PlannerValues);
  const draft = usePlannerDraft({ place: draftPlace, unitSystem: units.unitSystem, basedOn, original });
  const form = useForm<PlannerValues, unknown, SavedPlanInput>({
    resolver: plannerResolver(pieceId, units),
    defaultValues: draft.restored ? formDefaultsOf(draft.restored.values) : original,
  });
  const { errors } = form.formState;
  const values = useWatch({ control: form.control }) as PlannerValues;
  const live = useLivePlan({ values, pieceId, units, resinSystems, pigments, scaleResolutionG, offRatioTolerancePct });
  const unit = shownUnitNames(units.unitSystem);
  const molds = usePieceMolds(pieceId);
  const chosenMoldId = values.cavity?.source === 'mold' && values.cavity.moldId ? values.cavity.moldId : null;
  const chosenMold = useMold(chosenMoldId);
  const chosen: ChosenMold = chosenMold.data
    ? { state: 'found', mold: chosenMold.data }
    : hasStatus(chosenMold.error, 404)
      ? { state: 'gone' }
      : { state: 'loading' };
  const moldChoicesShown = molds.data ? moldChoices(molds.data.items, values.cavity?.moldId ?? '', chosen, pieceId) : [];
  const readyMolds = molds.data ? moldOptions(molds.data.items) : [];
  const report = chosenMold.data?.report ?? null;
  const dam = values.cavity?.dam ?? 'outline';
  const floorInMouldMm = report ? report.floorMm[dam] : null;
  const rimAboveFloorMm = report && floorInMouldMm !== null ? report.bboxMm.max[2] - floorInMouldMm : null;
  const typedLevelMm = typeof values.fillLevelMm === 'number' ? baseQuantity(values.fillLevelMm, 'length', units.unitSystem) : Number.NaN;

  const unsaved = draft.differs(values);
  const guard = useLeaveGuard(unsaved);
  const key = valuesKey(values);
  // Every change goes to the draft (written a moment after typing stops); the original values again forget it. The
  // key stands for the values, which are a new object on every render.
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `key` is the values' identity; `draft` is stable
  useEffect(() => draft.keep(values), [key]);

  const source = values.cavity?.source ?? 'shape';
  const kind = values.cavity?.shape?.kind ?? 'rectangle';
  const sealOn = Boolean(values.sealCoat?.enabled);
  const airOn = Boolean(values.shopAir?.enabled);
  const woodOn = Boolean(values.wood?.enabled);
  const chosenPigment = pigments.find((p) => p.id === values.deepPour?.pigmentId);

  const number = (name: Parameters<typeof form.register>[0]) => form.register(name, { setValueAs: requiredNumber });
  const optional = (name: Parameters<typeof form.register>[0]) => form.register(name, { setValueAs: optionalNumber });
  const pigmentField = form.register('deepPour.pigmentId', {
    onChange: (event: { target: { value: string } }) => {
      const pigment = pigments.find((p) => p.id === event.target.value);
      if (pigment && !(Number(form.getValues('deepPour.pigmentPct')) > 0)) form.setValue('deepPour.pigmentPct', pigment.recommendedPct);
    },
  });

  const onSubmit = form.handleSubmit(async (input) => {
    setFormError(null);
    // The page a save goes to is not "leaving with unsaved changes".
    guard.allow(true);
    try {
      await save(input);
      draft.forget(true);
    } catch (error) {
      guard.allow(false);
      let placed = false;
      if (isApiError(error)) {
        for (const [path, message] of Object.entries(error.fields)) {
          form.setError(fieldOfIssuePath(path.split('.')) as Parameters<typeof form.setError>[0], { type: 'server', message }, { shouldFocus: !placed });
          placed = true;
        }
      }
      setFormError(isApiError(error) ? error.message : errorNotice(error).message);
    }
  });

  return (
    <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Pour plan">
        <FormAlert message={formError} title="Could not save the pour plan" />
        {draft.restored ? (
          <Alert
            tone="info"
            title="Your unsaved changes are back"
            live="none"
            actions={
              <Button
                variant="secondary"
                onClick={() => {
                  draft.forget(false);
                  form.reset(original);
                }}
              >
                Discard them
              </Button>
            }
          >
            This browser kept what you typed <DateTime iso={draft.restored.savedAt} />. Save the plan to keep it for good.
          </Alert>
        ) : null}
        <Field label="Plan name" hint="How the run sheet and the cure board will call it." error={errors.name?.message} required>
          {(control) => <Input {...control} maxLength={120} {...form.register('name')} />}
        </Field>

        <PlannerSection legend="Cavity">
          <ChoiceGroup legend="Cavity from" choices={sourceChoices} error={errors.cavity?.source?.message} inputProps={form.register('cavity.source')} />
          {source === 'shape' ? (
            <>
              <Field label="Shape of the cavity" error={errors.cavity?.shape?.kind?.message} required>
                {(control) => <Select {...control} options={shapeOptions} {...form.register('cavity.shape.kind')} />}
              </Field>
              <FieldGrid>
                {kind === 'rectangle' || kind === 'channel' ? (
                  <>
                    <Field label={`Length (${unit.length})`} error={errors.cavity?.shape?.lengthMm?.message} required>
                      {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.lengthMm')} />}
                    </Field>
                    <Field label={`Width (${unit.length})`} error={errors.cavity?.shape?.widthMm?.message} required>
                      {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.widthMm')} />}
                    </Field>
                  </>
                ) : null}
                {kind === 'cylinder' ? (
                  <Field label={`Diameter (${unit.length})`} error={errors.cavity?.shape?.diameterMm?.message} required>
                    {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.diameterMm')} />}
                  </Field>
                ) : null}
                {kind === 'area_depth' ? (
                  <>
                    <Field label={`Outline area (${unit.area})`} error={errors.cavity?.shape?.areaMm2?.message} required>
                      {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.areaMm2')} />}
                    </Field>
                    <Field label={`Average depth (${unit.length})`} error={errors.cavity?.shape?.averageDepthMm?.message} required>
                      {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.averageDepthMm')} />}
                    </Field>
                    <Field label={`Deepest point (${unit.length})`} hint="Leave empty for a flat floor." error={errors.cavity?.shape?.maxDepthMm?.message}>
                      {(control) => <Input {...control} inputMode="decimal" {...optional('cavity.shape.maxDepthMm')} />}
                    </Field>
                    <Field
                      label={`Outline perimeter (${unit.length})`}
                      hint="Leave empty to estimate the walls from a circle of the same area."
                      error={errors.cavity?.shape?.perimeterMm?.message}
                    >
                      {(control) => <Input {...control} inputMode="decimal" {...optional('cavity.shape.perimeterMm')} />}
                    </Field>
                  </>
                ) : (
                  <Field label={`Depth (${unit.length})`} error={errors.cavity?.shape?.depthMm?.message} required>
                    {(control) => <Input {...control} inputMode="decimal" {...number('cavity.shape.depthMm')} />}
                  </Field>
                )}
              </FieldGrid>
            </>
          ) : (
            <>
              {molds.isError ? <p className="text-ember-700">The piece&apos;s moulds cannot be listed right now: {errorNotice(molds.error).message}</p> : null}
              {molds.data && readyMolds.length === 0 ? (
                <p className="text-ink-soft">This piece has no mould with a finished cavity report yet. Plan with a quick shape meanwhile.</p>
              ) : null}
              {/* The picker waits for the piece's moulds, so a plan's own mould is selected once there is an option for it. */}
              {molds.data ? (
                <Field label="Mould" error={errors.cavity?.moldId?.message ?? (chosen.state === 'gone' ? goneMoldWords : undefined)} required>
                  {(control) => <Select {...control} options={moldChoicesShown} emptyOption="Choose the mould" {...form.register('cavity.moldId')} />}
                </Field>
              ) : molds.isPending ? (
                <p className="text-ink-soft">Loading the piece&apos;s moulds…</p>
              ) : null}
              <ChoiceGroup
                legend="How the pour is contained"
                choices={damChoices}
                error={errors.cavity?.dam?.message}
                inputProps={form.register('cavity.dam')}
              />
            </>
          )}
          <Field
            label={`Fill level (${unit.length})`}
            hint={
              source === 'shape'
                ? 'Height of the resin surface above the floor of the cavity; its full depth fills it to the rim.'
                : rimAboveFloorMm !== null
                  ? `Height of the resin surface above the cavity floor, where the deepest resin stands: up to ${formatLength(rimAboveFloorMm, units.unitSystem).text} at the top of the mould.`
                  : 'Height of the resin surface above the cavity floor, where the deepest resin stands.'
            }
            error={errors.fillLevelMm?.message}
            required
          >
            {(control) => <Input {...control} inputMode="decimal" {...number('fillLevelMm')} />}
          </Field>
          {source === 'mold' && floorInMouldMm !== null ? (
            <p className="text-sm text-ink-soft" data-testid="planner-level-in-mould-frame">
              In the mould file’s own frame: cavity floor at {formatLength(floorInMouldMm, units.unitSystem).text}
              {Number.isFinite(typedLevelMm) ? `, resin surface at ${formatLength(floorInMouldMm + typedLevelMm, units.unitSystem).text}` : ''}.
            </p>
          ) : null}
        </PlannerSection>

        <PlannerSection legend="Deep pour" hint="The product decides how thick each layer and how heavy each cup may be.">
          <Field label="Deep-pour product" error={errors.deepPour?.resinSystemId?.message} required>
            {(control) => (
              <Select
                {...control}
                options={productOptions(resinSystems, values.deepPour?.resinSystemId ?? '', unitSystem)}
                emptyOption="Choose from the shelf"
                {...form.register('deepPour.resinSystemId')}
              />
            )}
          </Field>
          <FieldGrid>
            <Field label="Pigment" error={errors.deepPour?.pigmentId?.message}>
              {(control) => (
                <Select {...control} options={pigmentOptions(pigments, values.deepPour?.pigmentId ?? '')} emptyOption="No pigment" {...pigmentField} />
              )}
            </Field>
            {chosenPigment ? (
              <Field
                label="Pigment (% of part A + part B by mass)"
                hint={`Recommended ${chosenPigment.recommendedPct} %, at most ${chosenPigment.maxPct} %.`}
                error={errors.deepPour?.pigmentPct?.message}
                required
              >
                {(control) => <Input {...control} inputMode="decimal" {...number('deepPour.pigmentPct')} />}
              </Field>
            ) : null}
          </FieldGrid>
        </PlannerSection>

        <PlannerSection legend="Seal coat">
          <Switch
            label="Seal the wood first"
            hint="A thin coat that closes the pores, so the deep pour does not bubble out of the wood."
            inputProps={form.register('sealCoat.enabled')}
          />
          {sealOn ? (
            <>
              <Field label="Seal-coat product" error={errors.sealCoat?.resinSystemId?.message} required>
                {(control) => (
                  <Select
                    {...control}
                    options={productOptions(resinSystems, values.sealCoat?.resinSystemId ?? '', unitSystem)}
                    emptyOption="Choose from the shelf"
                    {...form.register('sealCoat.resinSystemId')}
                  />
                )}
              </Field>
              <FieldGrid>
                <Field
                  label="Film thickness (mm)"
                  hint="A seal coat is a few tenths of a millimetre."
                  error={errors.sealCoat?.filmThicknessMm?.message}
                  required
                >
                  {(control) => <Input {...control} inputMode="decimal" {...number('sealCoat.filmThicknessMm')} />}
                </Field>
                <Field label="Coats" error={errors.sealCoat?.coats?.message} required>
                  {(control) => <Input {...control} inputMode="numeric" {...number('sealCoat.coats')} />}
                </Field>
              </FieldGrid>
              <Field
                label="How much the wood soaks up"
                hint="Common-practice starting points; test scraps tell the truth for your wood."
                error={values.sealCoat?.absorption === 'custom' ? undefined : errors.sealCoat?.absorptionFactor?.message}
                required
              >
                {(control) => <Select {...control} options={absorptionOptions} emptyOption="Choose the wood" {...form.register('sealCoat.absorption')} />}
              </Field>
              {values.sealCoat?.absorption === 'custom' ? (
                <Field
                  label="Absorption factor (× the film)"
                  hint="1 means the wood takes up nothing; 2 means it drinks as much again."
                  error={errors.sealCoat?.absorptionFactor?.message}
                  required
                >
                  {(control) => <Input {...control} inputMode="decimal" {...number('sealCoat.absorptionFactor')} />}
                </Field>
              ) : null}
            </>
          ) : null}
        </PlannerSection>

        <PlannerSection legend="Margins" hint="Named extras, so no total hides them.">
          <FieldGrid>
            <Field label="Over-pour (% of each layer)" hint="A small extra that makes sure the fill is full." error={errors.overPourPct?.message} required>
              {(control) => <Input {...control} inputMode="decimal" {...number('overPourPct')} />}
            </Field>
            <Field label="Cup waste, per cup" hint="What a scraped cup still holds." error={errors.cupWaste?.amount?.message} required>
              {(control) => <Input {...control} inputMode="decimal" {...number('cupWaste.amount')} />}
            </Field>
            <Field label="Cup waste is weighed in">
              {(control) => <Select {...control} options={cupWasteUnits(units.unitSystem)} {...form.register('cupWaste.unit')} />}
            </Field>
          </FieldGrid>
        </PlannerSection>

        <PlannerSection legend="Shop">
          <Field
            label={`Shop temperature (${unit.temperature})`}
            hint="The times of the data sheet are stretched or shortened for it."
            error={errors.shopTempC?.message}
            required
          >
            {(control) => <Input {...control} inputMode="decimal" {...number('shopTempC')} />}
          </Field>
          <Switch
            label="Check the dew point"
            hint="With the humidity and the wood's surface temperature, the plan warns about condensation and amine blush."
            inputProps={form.register('shopAir.enabled')}
          />
          {airOn ? (
            <FieldGrid>
              <Field label="Relative humidity (%)" error={errors.shopAir?.rhPct?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('shopAir.rhPct')} />}
              </Field>
              <Field label={`Surface temperature (${unit.temperature})`} error={errors.shopAir?.surfaceTempC?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('shopAir.surfaceTempC')} />}
              </Field>
            </FieldGrid>
          ) : null}
        </PlannerSection>

        <PlannerSection legend="Wood blank">
          <Switch label="Add the wood to the cost" hint="Priced by the board foot (144 cubic inches)." inputProps={form.register('wood.enabled')} />
          {woodOn ? (
            <FieldGrid>
              <Field label={`Blank length (${unit.length})`} error={errors.wood?.lengthMm?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('wood.lengthMm')} />}
              </Field>
              <Field label={`Blank width (${unit.length})`} error={errors.wood?.widthMm?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('wood.widthMm')} />}
              </Field>
              <Field label={`Blank thickness (${unit.length})`} error={errors.wood?.thicknessMm?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('wood.thicknessMm')} />}
              </Field>
              <Field label={`Price per board foot (${currency})`} error={errors.wood?.pricePerBoardFoot?.message} required>
                {(control) => <Input {...control} inputMode="decimal" {...number('wood.pricePerBoardFoot')} />}
              </Field>
            </FieldGrid>
          ) : null}
        </PlannerSection>

        <div>
          <Button type="submit" busy={busy} busyLabel="Saving…">
            {submitLabel}
          </Button>
        </div>
      </form>
      {/* On wide screens the numbers stay in view beside the form and scroll on their own. */}
      <div
        tabIndex={0}
        role="region"
        aria-label="Live numbers of this plan"
        className="xl:sticky xl:top-4 xl:max-h-[calc(100dvh-2rem)] xl:overflow-y-auto xl:pr-1"
      >
        <LivePlanPanel live={live} unitSystem={unitSystem} currency={currency} renderMould3D={renderMould3D} />
      </div>
      <ConfirmDialog
        open={guard.blocker.state === 'blocked'}
        title="Leave without saving?"
        confirmLabel="Leave the planner"
        cancelLabel="Stay and save"
        tone="primary"
        onConfirm={() => guard.blocker.proceed?.()}
        onCancel={() => guard.blocker.reset?.()}
      >
        This plan has changes that are not saved. This browser keeps them as a draft and shows them again when you come back to the planner; nobody else sees
        them until you save.
      </ConfirmDialog>
    </div>
  );
}
