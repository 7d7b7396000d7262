import { formatLength, formatTemperature, formatWeighedMass, type Caution, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';
import { useId } from 'react';
import { QrCode } from '../../../components/ui/QrCode';
import { mixRatioWords } from '../utils/mix-ratio-words';
import { formatHours, formatMinutes } from '../utils/plan-format';
import type { RunSheetBatch } from '../utils/run-sheet';
import { CautionList } from './CautionList';

/** Where a printed cup's QR code leads, and those words for people. */
export interface CupLink {
  href: string;
  opens: string;
}

export interface BatchCardProps {
  batch: RunSheetBatch;
  link: CupLink;
  cautions: readonly Caution[];
  unitSystem: UnitSystem;
  scaleResolutionG: ScaleResolutionG;
}

function Amount({ part, grams }: { part: string; grams: string }) {
  return (
    <div className="run-sheet-amount flex flex-col rounded-lg border-2 border-walnut-800 px-3 py-2" data-print-border>
      <span className="text-sm font-semibold uppercase tracking-wide">{part}</span>
      <span className="text-3xl font-bold tabular-nums">{grams}</span>
    </div>
  );
}

function Blank({ label }: { label: string }) {
  return (
    <span className="inline-flex items-end gap-2">
      {label}
      <span aria-hidden="true" className="inline-block w-28 border-b-2 border-walnut-800" data-print-border />
    </span>
  );
}

/** One cup as the apprentice weighs it: what goes in, how much of each part, and the blanks to fill in. */
export function BatchCard({ batch, cautions, unitSystem, scaleResolutionG, link }: BatchCardProps) {
  const mixedId = useId();
  const grams = (g: number) => formatWeighedMass(g, unitSystem, scaleResolutionG).text;
  return (
    <article
      aria-label={`Cup ${batch.order} of ${batch.of}`}
      className="run-sheet-card relative flex flex-col gap-3 rounded-xl border-2 border-walnut-800 bg-white p-4"
      data-print-border
    >
      {/* In the corner, beside the heading and the product lines, so the code adds no height to the card. */}
      <QrCode value={link.href} label={`QR code: opens ${link.opens} to log cup ${batch.order}`} sizePx={96} className="run-sheet-qr absolute top-4 right-4" />
      {/* At least as tall as the code, so the amounts below never run under it. */}
      <div className="run-sheet-top flex flex-col gap-3">
        <header className="run-sheet-beside-qr flex flex-wrap items-baseline justify-between gap-2">
          <h3 className="text-2xl font-bold">
            Cup {batch.order} of {batch.of}
          </h3>
          <p className="text-lg font-semibold">
            {batch.pourLabel} · batch {batch.batchInPour} of {batch.batchesInPour}
          </p>
        </header>
        <p className="run-sheet-beside-qr text-lg">
          <strong>{batch.product.name}</strong> · mix ratio {mixRatioWords(batch.product.mixRatio)} ·{' '}
          <strong>
            pot life {formatMinutes(batch.potLifeMin)} at {formatTemperature(batch.shopTempC, unitSystem).text}
          </strong>
          {batch.potLifeShortenedByHeat ? ' (shortened: a cup this size heats itself)' : ''}
        </p>
        {batch.targetLevelMm !== null || batch.window || batch.forecastPeakC !== null ? (
          <p className="run-sheet-beside-qr text-lg" data-testid="pour-timing">
            {[
              batch.targetLevelMm !== null ? (
                <span key="level">
                  Fill to <strong>{formatLength(batch.targetLevelMm, unitSystem).text}</strong> above the cavity floor
                </span>
              ) : null,
              batch.window ? (
                <span key="window">
                  pour <strong>{formatHours(batch.window.opensH)}</strong> to <strong>{formatHours(batch.window.closesH)}</strong> after{' '}
                  {batch.window.afterLabel.toLowerCase()}
                </span>
              ) : null,
              batch.forecastPeakC !== null ? (
                <span key="peak" className={batch.forecastOverLimit ? 'font-semibold text-ember-700' : undefined}>
                  estimated peak {formatTemperature(batch.forecastPeakC, unitSystem).text}
                  {batch.forecastOverLimit ? ', over the accepted peak' : ''}
                </span>
              ) : null,
            ]
              .filter((part) => part !== null)
              .flatMap((part, i) => (i === 0 ? [part] : [' · ', part]))}
          </p>
        ) : null}
      </div>
      <div className={batch.pigmentG > 0 ? 'grid grid-cols-2 gap-2 sm:grid-cols-4' : 'grid grid-cols-3 gap-2'}>
        <Amount part="Part A" grams={grams(batch.partAG)} />
        <Amount part="Part B" grams={grams(batch.partBG)} />
        {batch.pigmentG > 0 ? <Amount part={batch.pigmentName ? `Pigment: ${batch.pigmentName}` : 'Pigment'} grams={grams(batch.pigmentG)} /> : null}
        <Amount part="Cup total" grams={grams(batch.totalG)} />
      </div>
      {batch.offRatioPct !== null ? (
        <p className="font-semibold text-ember-700">
          On a {scaleResolutionG} g scale these grams are {batch.offRatioPct > 0 ? '+' : ''}
          {batch.offRatioPct.toFixed(1)} % off the product&apos;s ratio: weigh on a finer scale if you can.
        </p>
      ) : null}
      {/* The blanks the apprentice fills in by hand, on one line where the paper is wide enough. */}
      <p className="flex flex-wrap items-end gap-x-6 gap-y-3 text-base">
        <Blank label="Lot A" />
        <Blank label="Lot B" />
        {batch.pigmentG > 0 ? <Blank label="Lot pigment" /> : null}
        <span className="inline-flex flex-wrap items-end gap-x-3 gap-y-3">
          <input id={mixedId} type="checkbox" className="size-6 accent-walnut-800" />
          <label htmlFor={mixedId} className="run-sheet-tick inline-flex min-h-touch min-w-touch items-center font-semibold">
            Mixed
          </label>
          <Blank label="by" />
          <Blank label="at" />
        </span>
      </p>
      <CautionList cautions={cautions} label={`Cautions for cup ${batch.order}`} />
    </article>
  );
}
