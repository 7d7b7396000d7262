import { formatLength, formatVolume, mm3ToMl, type UnitSystem } from '@gelpoint/core';
import type { CavityFill } from '../types';
import { formatArea } from '../utils/area-format';
import { damWords } from './DamChoice';

export interface FillFiguresProps {
  fill: CavityFill;
  /** The level: height of the resin surface above the cavity floor. */
  heightMm: number;
  unitSystem: UnitSystem;
  /** The numbers are of the level before while the new ones are on their way. */
  updating: boolean;
}

/** The numbers of one fill level, the ones a pour plan takes, each with its unit. */
export function FillFigures({ fill, heightMm, unitSystem, updating }: FillFiguresProps) {
  const volume = formatVolume(mm3ToMl(fill.volumeMm3), unitSystem).text;
  const level = formatLength(heightMm, unitSystem).text;
  return (
    <div className="flex flex-col gap-4" aria-busy={updating || undefined}>
      <p role="status" className="rounded-lg bg-resin-50 px-4 py-3 text-lg">
        <span className="block text-sm font-semibold text-resin-700">Fill volume, resin {level} above the cavity floor</span>
        <strong className="text-3xl font-bold text-walnut-900 tabular-nums" data-testid="fill-volume">
          {volume}
        </strong>
        {updating ? <span className="ml-2 text-sm text-ink-soft">updating…</span> : null}
      </p>
      <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-2">
        <dt className="text-ink-soft">Wetted area (for the seal coat)</dt>
        <dd className="text-right font-semibold tabular-nums">{formatArea(fill.wettedAreaMm2, unitSystem).text}</dd>
        <dt className="text-ink-soft">Deepest resin</dt>
        <dd className="text-right font-semibold tabular-nums">{formatLength(fill.maxDepthMm, unitSystem).text}</dd>
        <dt className="text-ink-soft">Trapped air</dt>
        <dd className="text-right font-semibold tabular-nums">
          {fill.trappedAirMm3 > 0 ? formatVolume(mm3ToMl(fill.trappedAirMm3), unitSystem).text : 'None'}
        </dd>
        <dt className="text-ink-soft">Held in by</dt>
        <dd className="text-right font-semibold">{damWords[fill.dam]}</dd>
      </dl>
    </div>
  );
}
