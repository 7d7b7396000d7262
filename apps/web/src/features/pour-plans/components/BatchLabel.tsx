import { formatWeighedMass, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';
import type { RunSheetBatch } from '../utils/run-sheet';

export interface BatchLabelProps {
  pieceName: string;
  batch: RunSheetBatch;
  unitSystem: UnitSystem;
  scaleResolutionG: ScaleResolutionG;
}

/** A small label for the cup itself, so a cup on the bench can be told apart from the next. */
export function BatchLabel({ pieceName, batch, unitSystem, scaleResolutionG }: BatchLabelProps) {
  const grams = (g: number) => formatWeighedMass(g, unitSystem, scaleResolutionG).text;
  return (
    <li className="run-sheet-label flex flex-col gap-0.5 rounded-md border border-dashed border-walnut-800 p-2 text-sm" data-print-border>
      <span className="font-bold">{pieceName}</span>
      <span>
        {batch.pourLabel}, batch {batch.batchInPour} of {batch.batchesInPour} (cup {batch.order} of {batch.of})
      </span>
      <span>{batch.product.name}</span>
      <span className="tabular-nums">
        A {grams(batch.partAG)} · B {grams(batch.partBG)}
        {batch.pigmentG > 0 ? ` · pigment ${grams(batch.pigmentG)}` : ''}
      </span>
      <span className="inline-flex items-end gap-1">
        Date <span aria-hidden="true" className="inline-block w-24 border-b border-walnut-800" data-print-border />
      </span>
    </li>
  );
}
