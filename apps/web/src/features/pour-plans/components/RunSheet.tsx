import type { PourPlan, UnitSystem } from '@gelpoint/core';
import { SafetyNote } from '../../../components/ui/SafetyNote';
import { cautionsFor } from '../utils/caution-words';
import { runSheetBatches } from '../utils/run-sheet';
import type { PlanSnapshot } from '../utils/saved-plan';
import { BatchCard } from './BatchCard';
import { BatchLabel } from './BatchLabel';
import { CautionList } from './CautionList';
import './run-sheet.css';

export interface RunSheetProps {
  planName: string;
  pieceName: string;
  plan: PourPlan;
  snapshot: PlanSnapshot;
  unitSystem: UnitSystem;
}

/** What the apprentice mixes from: the safety note once, then one card per cup in mixing order, then cup labels. */
export function RunSheet({ planName, pieceName, plan, snapshot, unitSystem }: RunSheetProps) {
  const batches = runSheetBatches(plan, snapshot);
  const scale = plan.resolution.grams;
  return (
    <div className="run-sheet flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <p className="text-sm font-semibold tracking-wide uppercase">Run sheet</p>
        <h1 className="text-3xl font-bold">{planName}</h1>
        <p className="text-lg">
          {pieceName} · {batches.length === 1 ? '1 cup' : `${batches.length} cups`} in the order to mix them: seal coats first, then the layers from the floor up.
        </p>
      </header>
      <SafetyNote headingLevel={2} />
      <CautionList cautions={[...cautionsFor(plan.cautions, 'layer'), ...cautionsFor(plan.cautions, 'product'), ...cautionsFor(plan.cautions, 'pigment')]} label="Cautions for this pour" />
      <section aria-labelledby="run-sheet-cups" className="flex flex-col gap-4">
        <h2 id="run-sheet-cups" className="text-2xl font-bold">
          Cups
        </h2>
        {batches.map((batch) => (
          <BatchCard key={batch.order} batch={batch} cautions={cautionsFor(plan.cautions, 'batch', batch.index)} unitSystem={unitSystem} scaleResolutionG={scale} />
        ))}
      </section>
      <section aria-labelledby="run-sheet-labels" className="run-sheet-labels flex flex-col gap-3">
        <h2 id="run-sheet-labels" className="text-2xl font-bold">
          Cup labels
        </h2>
        <p className="text-ink-soft">Cut along the dashed lines and stick one on each cup before it is filled.</p>
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3">
          {batches.map((batch) => (
            <BatchLabel key={batch.order} pieceName={pieceName} batch={batch} unitSystem={unitSystem} scaleResolutionG={scale} />
          ))}
        </ul>
      </section>
    </div>
  );
}
