import type { Shop } from '@gelpoint/contracts';
import { massRatioAToB, weightConcerns } from '@gelpoint/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { Input } from '../../../components/ui/Input';
import { Textarea } from '../../../components/ui/Textarea';
import { UnusualValueQuestion } from '../../../components/ui/UnusualValueQuestion';
import { ApiError, isApiError } from '../../../lib/api-error';
import { applyServerErrors } from '../../../lib/form-errors';
import { useLotChoices } from '../api/get-lot-choices';
import { useLogBatch, type BatchLogAnswer } from '../api/log-batch';
import {
  batchFormFields,
  batchFormSchema,
  emptyBatchForm,
  formFieldsOf,
  liveReadings,
  logBatchRequest,
  type BatchFormInput,
  type BatchFormValues,
} from '../utils/batch-form';
import type { RunSheetCup } from '../utils/plan-run-sheet';
import { inputUnitsOf } from '../utils/shop-units';
import { LiveMixWarnings } from './LiveMixWarnings';
import { LotField } from './LotField';
import { MixingCautions } from './MixingCautions';

export interface LogBatchFormProps {
  pourId: string;
  cup: RunSheetCup;
  shop: Shop;
  /** When "Start mixing" was tapped for this cup: that is when it was mixed. */
  mixingStartedAtMs: number | null;
  /** Logged, or kept on the phone to be sent when the connection returns (the card then says so). */
  onLogged: (answer: BatchLogAnswer) => void;
  onCancel: () => void;
}

const decimal = { inputMode: 'decimal', autoComplete: 'off', className: 'min-h-12! text-xl tabular-nums' } as const;

/** One cup as it was weighed and mixed: lots, grams, air and surface. */
export function LogBatchForm({ pourId, cup, shop, mixingStartedAtMs, onLogged, onCancel }: LogBatchFormProps) {
  const units = inputUnitsOf(shop.unitSystem);
  const pigmentRequired = cup.targetPigmentG > 0;
  const schema = useMemo(() => batchFormSchema(shop.unitSystem, { pigmentRequired }), [shop.unitSystem, pigmentRequired]);
  const form = useForm<BatchFormInput, unknown, BatchFormValues>({ resolver: zodResolver(schema), defaultValues: emptyBatchForm });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [expiredNotice, setExpiredNotice] = useState<string | null>(null);
  const [question, setQuestion] = useState<{ message: string; values: BatchFormValues } | null>(null);
  const log = useLogBatch(pourId, cup);

  const lotsA = useLotChoices({ part: 'A', productId: cup.product.id });
  const lotsB = useLotChoices({ part: 'B', productId: cup.product.id });
  const lotsPigment = useLotChoices(cup.pigment ? { part: 'pigment', productId: cup.pigment.id } : null);
  const listed = useMemo(
    () => new Set([...(lotsA.data?.items ?? []), ...(lotsB.data?.items ?? []), ...(lotsPigment.data?.items ?? [])].map((lot) => lot.id)),
    [lotsA.data, lotsB.data, lotsPigment.data],
  );

  const watched = useWatch({ control: form.control });
  const live = liveReadings(
    {
      weighedA: watched.weighedA ?? '',
      weighedB: watched.weighedB ?? '',
      ambientTemp: watched.ambientTemp ?? '',
      surfaceTemp: watched.surfaceTemp ?? '',
      rh: watched.rh ?? '',
    },
    shop.unitSystem,
  );

  const save = async (values: BatchFormValues, confirmUnusual: boolean) => {
    setFormError(null);
    try {
      const answer = await log.mutateAsync(
        logBatchRequest(values, cup.index, listed, mixingStartedAtMs === null ? null : new Date(mixingStartedAtMs).toISOString(), confirmUnusual),
      );
      setQuestion(null);
      onLogged(answer);
    } catch (error) {
      if (isApiError(error) && error.code === 'expired_lot_unacknowledged') {
        setExpiredNotice(error.message);
        return;
      }
      if (isApiError(error) && error.code === 'confirmation_needed') {
        setQuestion({ message: error.message, values });
        return;
      }
      const renamed = isApiError(error) ? new ApiError(error.status, error.code, error.message, formFieldsOf(error.fields)) : error;
      setFormError(applyServerErrors(renamed, form.setError, batchFormFields));
    }
  };

  const onSubmit = form.handleSubmit(async (values) => {
    // The API's question about grams far from the cup's targets, asked before anything is sent.
    const concerns = weightConcerns([
      { field: 'weighedAG', label: 'Part A', weighedG: values.weighedA, targetG: cup.targetAG },
      { field: 'weighedBG', label: 'Part B', weighedG: values.weighedB, targetG: cup.targetBG },
      { field: 'weighedPigmentG', label: 'Pigment', weighedG: values.weighedPigment, targetG: cup.targetPigmentG },
    ]);
    if (concerns.length > 0) {
      setQuestion({ message: concerns.map((c) => c.message).join(' '), values });
      return;
    }
    await save(values, false);
  });

  const massLabel = (what: string) => `${what} weighed (${units.mass})`;

  return (
    <form noValidate onSubmit={onSubmit} aria-label={`Log cup ${cup.order}`} className="flex flex-col gap-5">
      <MixingCautions cup={cup} unitSystem={shop.unitSystem} />
      <FormAlert message={formError} title="The batch was not logged" />
      {question ? (
        <UnusualValueQuestion
          message={question.message}
          confirmLabel="Log this cup as it is"
          busy={log.isPending}
          onConfirm={() => void save(question.values, true)}
        />
      ) : null}

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-bold text-walnut-900">Lots</legend>
        <LotField
          part="part A"
          productName={cup.product.name}
          lots={lotsA.data?.items ?? []}
          choice={watched.lotA ?? ''}
          unitSystem={shop.unitSystem}
          choiceProps={form.register('lotA')}
          numberProps={form.register('lotANumber')}
          numberError={errors.lotANumber?.message}
        />
        <LotField
          part="part B"
          productName={cup.product.name}
          lots={lotsB.data?.items ?? []}
          choice={watched.lotB ?? ''}
          unitSystem={shop.unitSystem}
          choiceProps={form.register('lotB')}
          numberProps={form.register('lotBNumber')}
          numberError={errors.lotBNumber?.message}
        />
        {cup.pigment ? (
          <LotField
            part="pigment"
            productName={cup.pigment.name}
            lots={lotsPigment.data?.items ?? []}
            choice={watched.lotPigment ?? ''}
            unitSystem={shop.unitSystem}
            choiceProps={form.register('lotPigment')}
            numberProps={form.register('lotPigmentNumber')}
            numberError={errors.lotPigmentNumber?.message}
          />
        ) : null}
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-bold text-walnut-900">What the scale showed</legend>
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label={massLabel('Part A')} error={errors.weighedA?.message} required>
            {(control) => <Input {...control} {...decimal} {...form.register('weighedA')} />}
          </Field>
          <Field label={massLabel('Part B')} error={errors.weighedB?.message} required>
            {(control) => <Input {...control} {...decimal} {...form.register('weighedB')} />}
          </Field>
          {cup.targetPigmentG > 0 ? (
            <Field label={massLabel('Pigment')} error={errors.weighedPigment?.message} required={pigmentRequired}>
              {(control) => <Input {...control} {...decimal} {...form.register('weighedPigment')} />}
            </Field>
          ) : null}
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-bold text-walnut-900">Air and surface</legend>
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label={`Air temperature (${units.temperature})`} error={errors.ambientTemp?.message}>
            {(control) => <Input {...control} {...decimal} {...form.register('ambientTemp')} />}
          </Field>
          <Field label={`Surface temperature (${units.temperature})`} hint="Of the wood, where the resin goes." error={errors.surfaceTemp?.message}>
            {(control) => <Input {...control} {...decimal} {...form.register('surfaceTemp')} />}
          </Field>
          <Field label="Relative humidity (%)" error={errors.rh?.message}>
            {(control) => <Input {...control} {...decimal} {...form.register('rh')} />}
          </Field>
        </div>
      </fieldset>

      <LiveMixWarnings
        weighedAG={live.weighedAG}
        weighedBG={live.weighedBG}
        massRatioAToB={massRatioAToB(cup.product.mixRatio, cup.product.densityAGPerMl, cup.product.densityBGPerMl)}
        ambientTempC={live.ambientTempC}
        surfaceTempC={live.surfaceTempC}
        rhPct={live.rhPct}
        tolerancePct={shop.offRatioTolerancePct}
        unitSystem={shop.unitSystem}
        scaleResolutionG={shop.scaleResolutionG}
      />

      <Field label="Notes" hint="Anything the next person should know about this cup." error={errors.notes?.message}>
        {(control) => <Textarea {...control} rows={3} maxLength={2000} {...form.register('notes')} />}
      </Field>

      {expiredNotice ? (
        <Alert tone="warning" title="A lot is past its date" live="alert">
          <p>{expiredNotice}</p>
          <label className="mt-3 flex min-h-12 items-center gap-3 font-semibold">
            <input type="checkbox" className="size-6 accent-walnut-800" {...form.register('acknowledgeExpiredLot')} />I know this lot is past its date
          </label>
        </Alert>
      ) : null}

      <div className="flex flex-wrap gap-3">
        <Button type="submit" className="min-h-12! px-6 text-lg" busy={log.isPending} busyLabel="Logging…">
          Log this batch
        </Button>
        <Button variant="secondary" className="min-h-12!" onClick={onCancel} disabled={log.isPending}>
          Not now
        </Button>
      </div>
    </form>
  );
}
