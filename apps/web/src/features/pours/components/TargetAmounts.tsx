import { formatWeighedMass, type UnitSystem } from '@gelpoint/core';
import { scaleStepOf } from '../utils/shop-units';

export interface TargetAmountsProps {
  partAG: number;
  partBG: number;
  pigmentG: number;
  totalG: number;
  pigmentName: string | null;
  unitSystem: UnitSystem;
  scaleResolutionG: number;
}

/** What goes on the scale for one cup, in type that reads from arm's length. */
export function TargetAmounts({ partAG, partBG, pigmentG, totalG, pigmentName, unitSystem, scaleResolutionG }: TargetAmountsProps) {
  const shown = (grams: number) => formatWeighedMass(grams, unitSystem, scaleStepOf(scaleResolutionG)).text;
  const parts = [
    { label: 'Part A', value: shown(partAG) },
    { label: 'Part B', value: shown(partBG) },
    ...(pigmentG > 0 ? [{ label: pigmentName ? `Pigment (${pigmentName})` : 'Pigment', value: shown(pigmentG) }] : []),
  ];
  return (
    <div>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        {parts.map((part) => (
          <div key={part.label} className="rounded-lg bg-paper p-3">
            <dt className="text-sm font-semibold text-ink-soft">{part.label}</dt>
            <dd className="text-4xl font-bold text-walnut-900 tabular-nums">{part.value}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-2 text-ink-soft">
        Cup total <strong className="text-ink tabular-nums">{shown(totalG)}</strong>
      </p>
    </div>
  );
}
