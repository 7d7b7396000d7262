import { formatLength, formatMass, formatTemperature, type UnitSystem } from '@gelpoint/core';
import type { PlanSnapshot, SnapshotProduct } from '../utils/saved-plan';
import { mixRatioWords } from '../utils/mix-ratio-words';

function ProductFacts({ role, product, unitSystem }: { role: string; product: SnapshotProduct; unitSystem: UnitSystem }) {
  return (
    <div className="rounded-lg bg-paper p-3">
      <h3 className="font-bold text-walnut-900">
        {role}: {product.name}
      </h3>
      <dl className="mt-2 grid grid-cols-[minmax(0,1fr)_minmax(0,auto)] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Mix ratio</dt>
        <dd className="text-right font-semibold">{mixRatioWords(product.mixRatio)}</dd>
        <dt className="text-ink-soft">Densities A / B</dt>
        <dd className="text-right font-semibold">
          {product.densityAGPerMl} / {product.densityBGPerMl} g/mL
        </dd>
        <dt className="text-ink-soft">Pot life</dt>
        <dd className="text-right font-semibold">
          {product.potLifeMin} min at {formatTemperature(product.referenceTempC, unitSystem).text}
        </dd>
        <dt className="text-ink-soft">Maximum layer</dt>
        <dd className="text-right font-semibold">{formatLength(product.maxLayerMm, unitSystem).text}</dd>
        <dt className="text-ink-soft">Maximum batch</dt>
        <dd className="text-right font-semibold">{formatMass(product.maxBatchG, unitSystem).text}</dd>
        <dt className="text-ink-soft">Working temperature</dt>
        <dd className="text-right font-semibold">
          {formatTemperature(product.minWorkTempC, unitSystem).text} to {formatTemperature(product.maxWorkTempC, unitSystem).text}
        </dd>
      </dl>
    </div>
  );
}

/** The shelf values the plan was saved with; a later change on the shelf does not reach them. */
export function SnapshotDetails({ snapshot, unitSystem }: { snapshot: PlanSnapshot; unitSystem: UnitSystem }) {
  return (
    <div className="flex flex-col gap-3">
      <ProductFacts role="Deep pour" product={snapshot.deepPour} unitSystem={unitSystem} />
      {snapshot.sealCoat ? <ProductFacts role="Seal coat" product={snapshot.sealCoat} unitSystem={unitSystem} /> : null}
      {snapshot.pigment ? (
        <div className="rounded-lg bg-paper p-3">
          <h3 className="font-bold text-walnut-900">Pigment: {snapshot.pigment.name}</h3>
          <p className="mt-2 text-sm">
            Recommended {snapshot.pigment.recommendedPct} %, at most {snapshot.pigment.maxPct} % of part A + part B by mass.
          </p>
        </div>
      ) : null}
      <p className="text-sm text-ink-soft">Weighed to the scale&apos;s {snapshot.scaleResolutionG} g steps.</p>
    </div>
  );
}
