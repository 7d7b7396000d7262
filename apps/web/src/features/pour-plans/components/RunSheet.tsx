import type { PourPlan, UnitSystem } from '@gelpoint/core';
import { SafetyNote } from '../../../components/ui/SafetyNote';
import { formatMoney } from '../../../lib/money';
import { useRootClass } from '../../../lib/use-root-class';
import { cautionsFor } from '../utils/caution-words';
import { runSheetBatches } from '../utils/run-sheet';
import type { PlanSnapshot } from '../utils/saved-plan';
import { BatchCard, type CupLink } from './BatchCard';
import { BatchLabel } from './BatchLabel';
import { CautionList } from './CautionList';
import './run-sheet.css';

export interface RunSheetProps {
  planName: string;
  pieceName: string;
  plan: PourPlan;
  snapshot: PlanSnapshot;
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code, for the cost of the materials. */
  currency: string;
  /** What each cup's QR code opens: the pour once it is started, the plan before. */
  cupLink: CupLink;
}

/** What the apprentice mixes from: the safety note once, then one card per cup in mixing order, then cup labels. */
export function RunSheet({ planName, pieceName, plan, snapshot, unitSystem, currency, cupLink }: RunSheetProps) {
  useRootClass('print-run-sheet');
  const batches = runSheetBatches(plan, snapshot);
  const scale = plan.resolution.grams;
  const [first, ...rest] = batches;
  const card = (batch: (typeof batches)[number]) => (
    <BatchCard
      key={batch.order}
      batch={batch}
      cautions={cautionsFor(plan.cautions, 'batch', batch.index)}
      unitSystem={unitSystem}
      scaleResolutionG={scale}
      link={cupLink}
    />
  );
  return (
    <div className="run-sheet flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <p className="text-sm font-semibold tracking-wide uppercase">Run sheet</p>
        <h1 className="text-3xl font-bold">{planName}</h1>
        <p className="text-lg">
          {pieceName} · {batches.length === 1 ? '1 cup' : `${batches.length} cups`} in the order to mix them:{' '}
          {plan.sealCoat ? 'seal coats first, then the layers from the floor up.' : 'the layers from the floor up.'}
        </p>
        <p>Resin and pigment for the whole pour cost {formatMoney(plan.cost.sealCoat + plan.cost.deepPour, currency)}.</p>
      </header>
      <SafetyNote headingLevel={2} />
      <CautionList
        cautions={[...cautionsFor(plan.cautions, 'layer'), ...cautionsFor(plan.cautions, 'product'), ...cautionsFor(plan.cautions, 'pigment')]}
        label="Cautions for this pour"
      />
      <section aria-labelledby="run-sheet-cups" className="flex flex-col gap-4">
        {/* The heading travels with the first cup, so a page never ends on it. */}
        <div className="run-sheet-keep flex flex-col gap-4">
          <h2 id="run-sheet-cups" className="text-2xl font-bold">
            Cups
          </h2>
          {first ? card(first) : null}
        </div>
        {rest.map(card)}
      </section>
      <section aria-labelledby="run-sheet-labels" className="run-sheet-labels flex flex-col gap-3">
        <header className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <h2 id="run-sheet-labels" className="text-2xl font-bold">
            Cup labels
          </h2>
          <p className="text-ink-soft">Cut along the dashed lines and stick one on each cup before it is filled; its code opens {cupLink.opens} on a phone.</p>
        </header>
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3">
          {batches.map((batch) => (
            <BatchLabel key={batch.order} pieceName={pieceName} batch={batch} unitSystem={unitSystem} scaleResolutionG={scale} link={cupLink} />
          ))}
        </ul>
      </section>
    </div>
  );
}
