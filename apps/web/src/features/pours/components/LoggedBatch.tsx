import type { BatchView } from '@gelpoint/contracts';
import { formatTemperature, formatWeighedMass, type UnitSystem } from '@gelpoint/core';
import { Alert } from '../../../components/ui/Alert';
import { DateTime } from '../../../components/ui/DateTime';
import { scaleStepOf } from '../utils/shop-units';

export interface LoggedBatchProps {
  batch: BatchView;
  unitSystem: UnitSystem;
  scaleResolutionG: number;
}

/** A cup as it was logged: what went in, against the run sheet, and what the server warned about. */
export function LoggedBatch({ batch, unitSystem, scaleResolutionG }: LoggedBatchProps) {
  const mass = (grams: number) => formatWeighedMass(grams, unitSystem, scaleStepOf(scaleResolutionG)).text;
  const temp = (tempC: number | null) => (tempC === null ? '—' : formatTemperature(tempC, unitSystem).text);
  const rows = [
    { label: 'Part A', lot: batch.lotA, weighed: batch.weighedAG, target: batch.targetAG },
    { label: 'Part B', lot: batch.lotB, weighed: batch.weighedBG, target: batch.targetBG },
    ...(batch.targetPigmentG > 0 || batch.weighedPigmentG > 0
      ? [{ label: 'Pigment', lot: batch.lotPigment, weighed: batch.weighedPigmentG, target: batch.targetPigmentG }]
      : []),
  ];
  return (
    <div className="flex flex-col gap-3">
      <p className="text-ink-soft">
        Mixed by <strong className="text-ink">{batch.mixedBy?.name ?? 'a former member'}</strong>, <DateTime iso={batch.mixedAt} />.
      </p>
      <dl className="grid gap-2 sm:grid-cols-3">
        {rows.map((row) => (
          <div key={row.label} className="rounded-lg bg-paper p-3">
            <dt className="text-sm font-semibold text-ink-soft">{row.label}</dt>
            <dd className="text-xl font-bold tabular-nums">
              {mass(row.weighed)} <span className="text-base font-normal text-ink-soft">of {mass(row.target)}</span>
            </dd>
            <dd className="text-sm text-ink-soft">Lot {row.lot || 'not recorded'}</dd>
          </div>
        ))}
      </dl>
      <p className="text-ink-soft">
        Off ratio {batch.offRatioPct.toFixed(1)} % · air {temp(batch.ambientTempC)} · surface {temp(batch.surfaceTempC)} · RH{' '}
        {batch.rhPct === null ? '—' : `${batch.rhPct} %`}
        {batch.dewPointC !== null ? ` · dew point ${temp(batch.dewPointC)}` : ''}
      </p>
      {batch.warnings.map((warning) => (
        <Alert key={warning.code} tone="warning" live="none">
          {warning.message}
        </Alert>
      ))}
      {batch.notes ? <p className="whitespace-pre-line">{batch.notes}</p> : null}
    </div>
  );
}
