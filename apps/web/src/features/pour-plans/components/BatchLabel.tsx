import { formatWeighedMass, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';
import { QrCode } from '../../../components/ui/QrCode';
import type { RunSheetBatch } from '../utils/run-sheet';
import type { CupLink } from './BatchCard';

export interface BatchLabelProps {
  pieceName: string;
  batch: RunSheetBatch;
  unitSystem: UnitSystem;
  scaleResolutionG: ScaleResolutionG;
  link: CupLink;
}

/** A small label for the cup itself, so a cup on the bench can be told apart from the next. */
export function BatchLabel({ pieceName, batch, unitSystem, scaleResolutionG, link }: BatchLabelProps) {
  const grams = (g: number) => formatWeighedMass(g, unitSystem, scaleResolutionG).text;
  return (
    <li className="run-sheet-label relative flex flex-col gap-0.5 rounded-md border border-dashed border-walnut-800 p-2 pr-20 text-sm" data-print-border>
      <QrCode value={link.href} label={`QR code: opens ${link.opens} for cup ${batch.order}`} sizePx={72} className="absolute top-2 right-2" />
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
